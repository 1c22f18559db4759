// How often records like this one came back, from the facts of the record itself; recomputed
// as the record changes. Never a score and never about the person: the model knows nothing of
// who captured the record.
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { useRiskModelQuery } from '@/components/queries/risk-model';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import type { CaptureRecord } from '@/shared/capture-record';
import { riskFacts, type RiskJob } from '@/shared/risk-facts';
import { hintSentence, riskHint } from '@/shared/risk-hint';
import type { StationAnalysis } from '@/shared/station-analysis';

type Props = {
  record: CaptureRecord;
  analysis: StationAnalysis | null;
  job: RiskJob;
  revision: number;
  // Whose screen: the technician reads "what would lower it", the reviewer the facts only.
  audience: 'technician' | 'reviewer';
};

export function RiskHintPanel({ record, analysis, job, revision, audience }: Props) {
  const model = useRiskModelQuery();
  const hint = useMemo(
    () => riskHint(model.data ?? null, riskFacts(record, analysis, job, revision)),
    [model.data, record, analysis, job, revision],
  );
  if (model.isPending) return null;
  return (
    <View style={styles.box} role="region" aria-label="Likely to come back">
      <Text variant="label">Likely to come back</Text>
      {hint.kind === 'withheld' ? (
        <Text role="status" aria-live="polite">
          {hint.message}
        </Text>
      ) : (
        <>
          <Text role="status" aria-live="polite">
            {hintSentence(hint.probability)}
          </Text>
          {hint.raising.length ? <Text variant="small">{`Raised most by: ${hint.raising.join('; ')}.`}</Text> : null}
          {audience === 'technician' && hint.lowering.length ? (
            <Text variant="small">{`What would lower it: ${hint.lowering.join(' ')}`}</Text>
          ) : null}
        </>
      )}
      <Text variant="muted">
        {audience === 'technician'
          ? 'About the record only, never a judgement of you: the model knows nothing of who captured it.'
          : 'From the record’s facts only; nothing is scored automatically.'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md, backgroundColor: colors.surface },
});
