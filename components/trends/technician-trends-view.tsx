import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import type { TechnicianTrends } from '@/shared/trends';

import { DownloadLink } from './download-link';
import { formatRate, intervalText } from './format';
import { ParetoChart } from './pareto-chart';
import { ReworkPChart } from './rework-p-chart';
import { ScoreLineChart } from './score-line-chart';

function Stat({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <View style={styles.stat}>
      <Text variant="muted">{label}</Text>
      <Text style={styles.value}>{value}</Text>
      {note ? <Text variant="small">{note}</Text> : null}
    </View>
  );
}

// One technician's (or the team's) quality for a period: headline numbers, then the charts.
export function TechnicianTrendsView({ trends, search }: { trends: TechnicianTrends; search: string }) {
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;
  const chartWidth = wide ? 500 : undefined;
  const fpy = trends.firstPassYield;
  return (
    <View style={{ gap: space.md }}>
      <View style={styles.stats}>
        <Stat label="Reviews" value={String(trends.reviews)} note={trends.tooFew ? 'Too few reviews for reliable rates' : undefined} />
        <Stat
          label="First-pass yield"
          value={fpy.total ? formatRate(fpy.interval!.estimate) : '–'}
          note={fpy.total ? `${fpy.accepted} of ${fpy.total}; 95 % interval ${intervalText(fpy.interval)}` : 'No first reviews'}
        />
        <Stat label="Revisions until accepted" value={trends.meanRevisionsToAcceptance?.toFixed(2) ?? '–'} note="Mean" />
        <Stat label="Recaptures" value={String(trends.recaptures)} />
        <Stat
          label="Site visit to acceptance"
          value={trends.medianHoursVisitToAcceptance === null ? '–' : `${Math.round(trends.medianHoursVisitToAcceptance)} h`}
          note="Median"
        />
      </View>
      <View style={[styles.charts, wide && styles.chartsWide]}>
        <View style={wide ? styles.cell : undefined}>
          <Section title="Mean score per week" summary="Weighted score, 0 to 100">
            <ScoreLineChart weekly={trends.weekly} maxWidth={chartWidth} />
          </Section>
        </View>
        <View style={wide ? styles.cell : undefined}>
          <Section title="Rework rate per week" summary="p-chart with 3-sigma limits per week">
            <ReworkPChart centre={trends.reworkChart.centre} rows={trends.reworkChart.rows} maxWidth={chartWidth} />
          </Section>
        </View>
        <View style={wide ? styles.cell : undefined}>
          <Section title="Most frequent shortfalls" summary="Criteria below full marks">
            <ParetoChart bars={trends.paretoCriteria} title="Criteria below full marks" maxWidth={chartWidth} />
          </Section>
        </View>
        <View style={wide ? styles.cell : undefined}>
          <Section title="Most frequent stock reasons" summary="Reasons reviewers picked">
            <ParetoChart bars={trends.paretoReasons} title="Stock reasons" maxWidth={chartWidth} />
          </Section>
        </View>
      </View>
      <DownloadLink path="/api/trends" search={search} label="Download the weekly table (CSV)" />
    </View>
  );
}

const styles = StyleSheet.create({
  stats: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  stat: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.md,
    minWidth: 160,
    flexGrow: 1,
    gap: 2,
  },
  value: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  charts: { gap: space.md },
  chartsWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cell: { flexBasis: 540, flexGrow: 1, maxWidth: 700 },
});
