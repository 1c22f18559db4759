import { Link, useRouter } from 'expo-router';

import { lazyView } from '@/components/lib/lazy-view';
import { useSessionQuery } from '@/components/queries/session';
import { periodSearch, useTechnicianTrendsQuery } from '@/components/queries/trends';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { colors } from '@/components/ui/theme';

import { PeriodPicker } from './period-picker';
import { usePeriodParams } from './trends-screen';

const TechnicianTrendsView = lazyView(() => import('./technician-trends-view').then((m) => m.TechnicianTrendsView), 'the charts');

// One technician's trends: a manager opens anyone's; a technician sees only their own.
export function TechnicianTrendsPage({ technicianId }: { technicianId: number | null }) {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const { weeks, rubricVersion, period } = usePeriodParams();
  const search = periodSearch(period, { technicianId: technicianId ?? undefined });
  const trends = useTechnicianTrendsQuery(search);
  const name = trends.data?.technician?.name ?? '…';
  return (
    <Screen title={technicianId === null ? 'My quality' : `Trends: ${name}`} subtitle={`${period.from} to ${period.to}`}>
      <PeriodPicker weeks={weeks} rubricVersion={rubricVersion} onChange={(c) => router.setParams(c as never)} />
      {me?.role === 'manager' && technicianId !== null ? (
        <Link
          href={`/jobs?technicianId=${technicianId}` as never}
          style={{ color: colors.accent, fontSize: 15 }}
        >{`Open ${name}'s jobs`}</Link>
      ) : null}
      {trends.error ? <Notice tone="error">{trends.error.message}</Notice> : null}
      {trends.data ? <TechnicianTrendsView trends={trends.data} search={search} /> : <Text variant="muted">Loading…</Text>}
    </Screen>
  );
}
