import { useSessionQuery } from '@/components/queries/session';
import { SignedInSummary } from '@/components/home/signed-in-summary';
import { RequireRole } from '@/components/shell/require-role';
import { Screen } from '@/components/ui/screen';

export default function QueuePage() {
  const { data: user } = useSessionQuery();
  return (
    <RequireRole roles={['reviewer', 'manager']}>
      <Screen title="Queue" subtitle="Capture records waiting for review">
        {user ? <SignedInSummary user={user} comingNext="The review queue opens here once capture records can be scored." /> : null}
      </Screen>
    </RequireRole>
  );
}
