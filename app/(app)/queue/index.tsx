import { QueueScreen } from '@/components/review/queue-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function QueuePage() {
  return (
    <RequireRole roles={['reviewer', 'manager']}>
      <QueueScreen />
    </RequireRole>
  );
}
