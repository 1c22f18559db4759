import { StyleSheet, View } from 'react-native';

import { Text } from './text';
import { colors, space } from './theme';

export function ProgressBar({ fraction, label }: { fraction: number; label: string }) {
  const percent = Math.round(Math.min(Math.max(fraction, 0), 1) * 100);
  return (
    <View style={{ gap: space.xs }}>
      <Text variant="small">{`${label}: ${percent} %`}</Text>
      <View role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} style={styles.track}>
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 10, backgroundColor: colors.line, borderRadius: 5, overflow: 'hidden' },
  fill: { height: 10, backgroundColor: colors.accent },
});
