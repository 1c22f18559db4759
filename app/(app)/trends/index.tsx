import { useSessionQuery } from '@/components/queries/session';
import { SignedInSummary } from '@/components/home/signed-in-summary';
import { RequireRole } from '@/components/shell/require-role';
import { Screen } from '@/components/ui/screen';

export default function TrendsPage() {
  const { data: user } = useSessionQuery();
  return (
    <RequireRole roles={['manager']}>
      <Screen title="Trends" subtitle="Per-technician quality over time">
        {user ? <SignedInSummary user={user} comingNext="Quality trends appear here once reviews are recorded." /> : null}
      </Screen>
    </RequireRole>
  );
}
