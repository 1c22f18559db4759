import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { colors, fonts, space } from './theme';

export function Checkbox({
  label,
  checked,
  onChange,
  hint,
}: {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  hint?: string;
}) {
  return (
    <Pressable role="checkbox" aria-checked={checked} accessibilityLabel={label} onPress={() => onChange(!checked)} style={styles.row}>
      <View style={[styles.box, checked && styles.boxChecked]}>{checked ? <Text style={styles.tick}>✓</Text> : null}</View>
      <View style={{ flexShrink: 1 }}>
        <Text>{label}</Text>
        {hint ? <Text variant="muted">{hint}</Text> : null}
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 40 },
  box: {
    width: 24,
    height: 24,
    borderWidth: 2,
    borderColor: colors.ink,
    borderRadius: 4,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  boxChecked: { backgroundColor: colors.ink },
  tick: { color: colors.surface, fontFamily: fonts.bold, fontSize: 16, lineHeight: 18 },
});
