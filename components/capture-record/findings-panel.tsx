import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { CheckResult } from '@/shared/pre-submit-checks';

// Pre-submit findings in words: what blocks submission, and what is only a warning.
export function FindingsPanel({ findings }: { findings: CheckResult }) {
  const clear = findings.missing.length === 0 && findings.warnings.length === 0;
  return (
    <View style={styles.panel} role="region" aria-label="Pre-submit checks">
      <Text variant="heading" role="heading" aria-level={2}>
        Pre-submit checks
      </Text>
      {clear ? <Text style={{ color: colors.pass, fontFamily: fonts.semibold }}>✓ Nothing missing, no warnings.</Text> : null}
      {findings.missing.length ? (
        <View style={{ gap: space.xs }}>
          <Text
            style={{ color: colors.fail, fontFamily: fonts.semibold }}
          >{`Missing before you can submit (${findings.missing.length})`}</Text>
          {findings.missing.map((f) => (
            <Text key={`m-${f.field}`} variant="small">{`✕ ${f.message}`}</Text>
          ))}
        </View>
      ) : null}
      {findings.warnings.length ? (
        <View style={{ gap: space.xs }}>
          <Text
            style={{ color: colors.rework, fontFamily: fonts.semibold }}
          >{`Warnings (${findings.warnings.length}): you can still submit`}</Text>
          {findings.warnings.map((f) => (
            <Text key={`w-${f.field}`} variant="small">{`! ${f.message}`}</Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderLeftWidth: 4,
    borderLeftColor: colors.accent,
    borderRadius: 8,
    padding: space.lg,
    gap: space.sm,
  },
});
