import { useSessionQuery } from '@/components/queries/session';
import { SignedInSummary } from '@/components/home/signed-in-summary';
import { RequireRole } from '@/components/shell/require-role';
import { Screen } from '@/components/ui/screen';

export default function JobsPage() {
  const { data: user } = useSessionQuery();
  return (
    <RequireRole roles={['technician', 'manager', 'admin']}>
      <Screen title={user?.role === 'technician' ? 'My jobs' : 'Jobs'}>
        {user ? <SignedInSummary user={user} comingNext="Jobs appear here once they are assigned." /> : null}
      </Screen>
    </RequireRole>
  );
}
