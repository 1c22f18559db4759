import { JobsScreen } from '@/components/jobs/jobs-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function JobsPage() {
  return (
    <RequireRole roles={['technician', 'reviewer', 'manager', 'admin']}>
      <JobsScreen />
    </RequireRole>
  );
}
