import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { DECISION_LABELS, DECISIONS } from '@/shared/review';
import type { Calibration, ReviewerRow } from '@/shared/trends';

import { formatRate } from './format';

export function ReviewerTable({ rows }: { rows: ReviewerRow[] }) {
  const columns = useMemo<DataTableColumn<ReviewerRow>[]>(
    () => [
      { id: 'reviewer', accessorFn: (r) => r.reviewer.name, header: 'Reviewer', meta: { width: 200 } },
      { accessorKey: 'reviews', header: 'Reviews', meta: { width: 110 } },
      {
        id: 'median',
        accessorFn: (r) => r.medianMinutesClaimToDecision ?? -1,
        header: 'Claim to decision',
        meta: { width: 180 },
        cell: ({ row }) => (
          <Text variant="small">
            {row.original.medianMinutesClaimToDecision === null
              ? '–'
              : `${Math.round(row.original.medianMinutesClaimToDecision)} min median`}
          </Text>
        ),
      },
      {
        id: 'late',
        accessorFn: (r) => r.lateShare ?? -1,
        header: 'Decided after due time',
        meta: { width: 200 },
        cell: ({ row }) => <Text variant="small">{formatRate(row.original.lateShare)}</Text>,
      },
    ],
    [],
  );
  return <DataTable label="Reviewers" columns={columns} data={rows} emptyText="No reviewers." getRowId={(r) => String(r.reviewer.id)} />;
}

export function CalibrationView({ calibration }: { calibration: Calibration }) {
  const k = (v: number | null) => (v === null ? 'not defined' : v.toFixed(2));
  return (
    <View style={{ gap: space.sm }}>
      <Text>{`${calibration.pairs} blind double review(s) in this period.`}</Text>
      {calibration.pairs < 5 ? (
        <Text variant="muted">Too few pairs for a reliable agreement figure; read these as a first look.</Text>
      ) : null}
      <View style={styles.row}>
        <View style={styles.stat}>
          <Text variant="muted">Agreement on the decision (Cohen&apos;s kappa)</Text>
          <Text style={styles.value}>{k(calibration.decisions.kappa)}</Text>
          <Text variant="small">
            {calibration.decisions.band ? `${calibration.decisions.band} (Landis & Koch 1977)` : 'Not enough data'}
          </Text>
        </View>
        <View style={styles.stat}>
          <Text variant="muted">Agreement on criterion scores (linear weighted kappa)</Text>
          <Text style={styles.value}>{k(calibration.criterionScores.kappa)}</Text>
          <Text variant="small">
            {calibration.criterionScores.band
              ? `${calibration.criterionScores.band} · ${calibration.criterionScores.n} scored criteria`
              : 'Not enough data'}
          </Text>
        </View>
        <View style={styles.stat}>
          <Text variant="muted">Mean difference of weighted scores</Text>
          <Text style={styles.value}>{calibration.meanAbsoluteScoreDifference?.toFixed(1) ?? '–'}</Text>
          <Text variant="small">points out of 100</Text>
        </View>
      </View>
      <Text variant="label">Decisions: first reviewer (rows) by second reviewer (columns)</Text>
      <View role="table" aria-label="Decision agreement table" style={styles.table}>
        <View role="row" style={styles.tr}>
          <Text style={styles.th}> </Text>
          {DECISIONS.map((d) => (
            <Text key={d} role="columnheader" style={styles.th}>
              {DECISION_LABELS[d].split(' (')[0]}
            </Text>
          ))}
        </View>
        {DECISIONS.map((a, i) => (
          <View key={a} role="row" style={styles.tr}>
            <Text role="rowheader" style={styles.th}>
              {DECISION_LABELS[a].split(' (')[0]}
            </Text>
            {calibration.decisions.table[i].map((n, j) => (
              <Text key={j} role="cell" style={[styles.td, i === j && { fontFamily: fonts.bold }]}>
                {String(n)}
              </Text>
            ))}
          </View>
        ))}
      </View>
      {calibration.reviewerPairs.map((p) => (
        <Text
          key={p.reviewers.join('-')}
          variant="small"
        >{`${p.reviewers[0]} and ${p.reviewers[1]}: ${p.n} pair(s), decision kappa ${k(p.decisionKappa)}${p.band ? ` (${p.band})` : ''}`}</Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  stat: { borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, minWidth: 220, flexGrow: 1, gap: 2 },
  value: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  table: { borderWidth: 1, borderColor: colors.line, alignSelf: 'flex-start' },
  tr: { flexDirection: 'row' },
  th: { width: 110, padding: 6, fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  td: { width: 110, padding: 6, fontSize: 13, color: colors.ink, textAlign: 'center' },
});
