import { StyleSheet, View } from 'react-native';

import { Text } from './text';
import { colors, fonts } from './theme';

export type BadgeTone = 'neutral' | 'pass' | 'rework' | 'fail' | 'accent';

const toneColor: Record<BadgeTone, string> = {
  neutral: colors.muted,
  pass: colors.pass,
  rework: colors.rework,
  fail: colors.fail,
  accent: colors.accent,
};

// The label always carries the meaning; colour only repeats it.
export function Badge({ label, tone = 'neutral' }: { label: string; tone?: BadgeTone }) {
  return (
    <View style={[styles.badge, { borderColor: toneColor[tone] }]}>
      <Text style={[styles.text, { color: toneColor[tone] }]}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    borderWidth: 1.5,
    borderRadius: 4,
    paddingHorizontal: 8,
    paddingVertical: 2,
    alignSelf: 'flex-start',
    backgroundColor: colors.surface,
  },
  text: { fontFamily: fonts.semibold, fontSize: 13 },
});
