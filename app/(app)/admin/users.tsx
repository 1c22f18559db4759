import { UsersScreen } from '@/components/admin/users-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function UsersPage() {
  return (
    <RequireRole roles={['admin']}>
      <UsersScreen />
    </RequireRole>
  );
}
