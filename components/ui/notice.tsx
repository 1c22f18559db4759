import { StyleSheet, View } from 'react-native';

import { Text } from './text';
import { colors, space } from './theme';

type Tone = 'error' | 'info' | 'caution';
const border: Record<Tone, string> = { error: colors.fail, info: colors.muted, caution: colors.rework };
const title: Record<Tone, string> = { error: 'Error', info: 'Note', caution: 'Caution' };

export function Notice({ tone = 'info', children }: { tone?: Tone; children: React.ReactNode }) {
  return (
    <View role={tone === 'error' ? 'alert' : undefined} style={[styles.box, { borderLeftColor: border[tone] }]}>
      <Text variant="label" style={{ color: border[tone] }}>
        {title[tone]}
      </Text>
      <Text>{children}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, backgroundColor: colors.surface, padding: space.md, gap: space.xs, borderRadius: 4 },
});
