import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { lazyView } from '@/components/lib/lazy-view';
import {
  periodSearch,
  useCalibrationQuery,
  useReviewerTrendsQuery,
  useTeamTrendsQuery,
  useTechnicianTrendsQuery,
} from '@/components/queries/trends';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';

import { DownloadLink } from './download-link';
import { periodFor, PeriodPicker } from './period-picker';
import { CalibrationView, ReviewerTable } from './reviewers-and-calibration';
import { TeamTable } from './team-table';

const TechnicianTrendsView = lazyView(() => import('./technician-trends-view').then((m) => m.TechnicianTrendsView), 'the charts');

export function usePeriodParams() {
  const params = useLocalSearchParams<{ weeks?: string; rubricVersion?: string }>();
  const weeks = ['4', '12', '26'].includes(params.weeks ?? '') ? params.weeks! : '12';
  const rubricVersion = /^\d+$/.test(params.rubricVersion ?? '') ? params.rubricVersion! : '';
  return { weeks, rubricVersion, period: { ...periodFor(Number(weeks)), rubricVersion } };
}

// The manager's home: the team's quality, each technician compared, reviewers and calibration.
export function TrendsScreen() {
  const router = useRouter();
  const { weeks, rubricVersion, period } = usePeriodParams();
  const search = periodSearch(period);
  const team = useTechnicianTrendsQuery(search);
  const table = useTeamTrendsQuery(search);
  const reviewers = useReviewerTrendsQuery(search);
  const calibration = useCalibrationQuery(search);
  const error = team.error ?? table.error ?? reviewers.error ?? calibration.error;

  return (
    <Screen title="Trends" subtitle={`Quality of the whole team, ${period.from} to ${period.to}. Demo data is invented.`}>
      <Link href="/trends/model" style={styles.link}>
        Rework-risk model: how it was fitted and how well it does
      </Link>
      <PeriodPicker weeks={weeks} rubricVersion={rubricVersion} onChange={(c) => router.setParams(c as never)} />
      {error ? <Notice tone="error">{error.message}</Notice> : null}
      {team.data ? <TechnicianTrendsView trends={team.data} search={search} /> : <Text variant="muted">Loading…</Text>}
      <Section title="Technicians compared" summary="Select a technician for their own trends and jobs">
        {table.data ? <TeamTable rows={table.data.rows} weeks={weeks} /> : null}
        <DownloadLink path="/api/trends/team" search={search} label="Download this table (CSV)" />
      </Section>
      <View style={{ gap: space.md }}>
        <Section title="Reviewers" summary="Workload, speed and timeliness">
          {reviewers.data ? <ReviewerTable rows={reviewers.data.rows} /> : null}
          <DownloadLink path="/api/trends/reviewers" search={search} label="Download this table (CSV)" />
        </Section>
        <Section title="Calibration" summary="Blind double reviews: how well reviewers agree">
          {calibration.data ? <CalibrationView calibration={calibration.data} /> : null}
          <DownloadLink path="/api/trends/calibration" search={search} label="Download reviewer pairs (CSV)" />
        </Section>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  link: { color: colors.ink, fontFamily: fonts.semibold, textDecorationLine: 'underline', minHeight: 44, paddingVertical: 10 },
});
