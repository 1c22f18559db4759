import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { Evaluation } from '@/shared/scoring';

// The live total, and in words why a review passes or fails.
export function ScoreSummary({ evaluation, passMark }: { evaluation: Evaluation; passMark: number }) {
  const verdict = !evaluation.complete ? 'Not all criteria scored yet' : evaluation.passed ? 'Passes' : 'Fails';
  const color = !evaluation.complete ? colors.muted : evaluation.passed ? colors.pass : colors.fail;
  return (
    <View style={[styles.box, { borderLeftColor: color }]} role="status" aria-live="polite">
      <Text style={styles.score}>{evaluation.score === null ? '–' : evaluation.score.toFixed(1)}</Text>
      <Text variant="muted">{`Weighted score out of 100 · pass mark ${passMark}`}</Text>
      <Text style={{ color, fontFamily: fonts.semibold }}>{verdict}</Text>
      {evaluation.failedRules.map((rule) => (
        <Text key={rule} variant="small">{`✕ ${rule}`}</Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderLeftWidth: 6,
    borderRadius: 8,
    padding: space.md,
    gap: 2,
  },
  score: { fontFamily: fonts.bold, fontSize: 36, color: colors.ink },
});
