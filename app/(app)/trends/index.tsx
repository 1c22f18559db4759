import { RequireRole } from '@/components/shell/require-role';
import { TrendsScreen } from '@/components/trends/trends-screen';

export default function TrendsPage() {
  return (
    <RequireRole roles={['manager']}>
      <TrendsScreen />
    </RequireRole>
  );
}
