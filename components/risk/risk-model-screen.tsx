// The manager's view of the rework-risk model: when and on what it was fitted, how it did on
// records it never saw, how well its percentages match what happened, and what each fact does
// to the odds of a record coming back.
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { useRiskFitMutation, useRiskModelQuery } from '@/components/queries/risk-model';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import { RISK_FACTS } from '@/shared/risk-facts';
import { oddsRatios, type RiskModelView } from '@/shared/risk-hint';

const pct = (x: number) => `${Math.round(x * 100)} %`;

function calibrationSummary(model: RiskModelView): string {
  const rows = model.figures.reliability;
  if (rows.length === 0) return 'No held-out records with both outcomes yet, so no calibration table.';
  const n = rows.reduce((s, r) => s + r.n, 0);
  const gap = rows.reduce((s, r) => s + r.n * Math.abs(r.meanPredicted - r.observed), 0) / n;
  return `On ${n} held-out records, the predicted share and the share that came back differ by ${Math.round(gap * 100)} percentage points on average across the ${rows.length} groups.`;
}

function Calibration({ model }: { model: RiskModelView }) {
  return (
    <View style={styles.card} role="group" aria-label="Calibration">
      <Text variant="heading" role="heading" aria-level={2}>
        Calibration on held-out records
      </Text>
      <Text>{calibrationSummary(model)}</Text>
      <View role="table" aria-label="Predicted against observed, by group">
        {model.figures.reliability.map((row) => (
          <View key={row.group} role="row" style={styles.calRow}>
            <Text role="cell" variant="small" style={styles.calLabel}>{`Group ${row.group} (${row.n})`}</Text>
            <View role="cell" style={styles.bars}>
              <View style={[styles.bar, styles.predicted, { width: `${Math.max(row.meanPredicted * 100, 1)}%` }]} />
              <View style={[styles.bar, styles.observed, { width: `${Math.max(row.observed * 100, 1)}%` }]} />
            </View>
            <Text
              role="cell"
              variant="small"
              style={styles.calText}
            >{`predicted ${pct(row.meanPredicted)}, came back ${pct(row.observed)}`}</Text>
          </View>
        ))}
      </View>
      <Text variant="muted">Upper bar (solid): the mean predicted share. Lower bar (outlined): the share that came back.</Text>
    </View>
  );
}

function OddsTable({ model }: { model: RiskModelView }) {
  const labels = new Map(RISK_FACTS.map((f) => [f.key, f.label]));
  return (
    <View style={styles.card} role="table" aria-label="Odds ratio per fact">
      <Text variant="heading" role="heading" aria-level={2}>
        What each fact does to the odds
      </Text>
      <Text variant="muted">Odds ratio with its 95 % interval: above 1 raises the chance of coming back, below 1 lowers it.</Text>
      {oddsRatios(model).map((r) => (
        <View key={r.key} role="row" style={styles.oddsRow}>
          <Text role="cell" style={{ flex: 1 }}>
            {labels.get(r.key) ?? r.key}
          </Text>
          <Text role="cell" style={styles.odds}>{`${r.ratio.toFixed(2)} (${r.low.toFixed(2)}–${r.high.toFixed(2)})`}</Text>
        </View>
      ))}
    </View>
  );
}

export function RiskModelScreen() {
  const model = useRiskModelQuery();
  const fit = useRiskFitMutation();
  const m = model.data;
  return (
    <Screen title="Rework-risk model" subtitle="Learnt from past first reviews; the facts of records only, never who captured them">
      {model.error ? <Notice tone="error">{model.error.message}</Notice> : null}
      {fit.error ? <Notice tone="error">{fit.error.message}</Notice> : null}
      {m === null ? <Notice tone="info">No model has been fitted yet.</Notice> : null}
      {m ? (
        <>
          <View style={styles.card}>
            <Text role="status">
              {m.usable ? 'The hint is shown to technicians and reviewers.' : `The hint is not shown. ${m.withheld ?? ''}`}
            </Text>
            <Text>{`Version ${m.version}, fitted ${formatDateTime(m.fittedAt)} on ${m.reviews} reviewed revisions (trained on the earlier ${m.figures.trained}, tested on the later ${m.figures.tested}).`}</Text>
            <Text>
              {m.figures.auc
                ? `Held-out area under the ROC curve: ${m.figures.auc.estimate.toFixed(2)} (95 % interval ${m.figures.auc.low.toFixed(2)}–${m.figures.auc.high.toFixed(2)}); 0.5 is a coin toss. Brier score ${m.figures.brier!.toFixed(3)} (0 is perfect).`
                : 'No held-out figures: the held-out records do not yet include both outcomes.'}
            </Text>
          </View>
          <Calibration model={m} />
          <OddsTable model={m} />
        </>
      ) : null}
      <Button label="Refit now" tone="secondary" onPress={() => fit.mutate()} busy={fit.isPending} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, backgroundColor: colors.surface },
  calRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: 4, flexWrap: 'wrap' },
  calLabel: { width: 110 },
  bars: { flex: 1, minWidth: 140, gap: 2 },
  bar: { height: 10, borderRadius: 2 },
  predicted: { backgroundColor: colors.ink },
  observed: { borderWidth: 2, borderColor: colors.ink, backgroundColor: colors.surface },
  calText: { minWidth: 200 },
  oddsRow: { flexDirection: 'row', gap: space.md, paddingVertical: 6, borderBottomWidth: 1, borderBottomColor: colors.line },
  odds: { fontFamily: fonts.semibold, minWidth: 150, textAlign: 'right' },
});
