import { ActivityIndicator, Pressable, StyleSheet } from 'react-native';

import { Text } from './text';
import { colors, fonts, space } from './theme';

type Props = {
  label: string;
  onPress: () => void;
  tone?: 'primary' | 'secondary' | 'danger';
  busy?: boolean;
  disabled?: boolean;
  accessibilityHint?: string;
  testID?: string;
};

export function Button({ label, onPress, tone = 'primary', busy, disabled, accessibilityHint, testID }: Props) {
  const inactive = disabled || busy;
  return (
    <Pressable
      role="button"
      accessibilityLabel={label}
      accessibilityHint={accessibilityHint}
      accessibilityState={{ disabled: inactive, busy }}
      disabled={inactive}
      onPress={onPress}
      testID={testID}
      style={(state) => {
        const { pressed, focused } = state as { pressed: boolean; focused?: boolean };
        return [styles.base, styles[tone], pressed && styles.pressed, inactive && styles.inactive, focused && styles.focused];
      }}
    >
      {busy ? <ActivityIndicator color={tone === 'secondary' ? colors.ink : colors.surface} /> : null}
      <Text style={[styles.label, tone === 'secondary' ? { color: colors.ink } : { color: colors.surface }]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 44,
    paddingHorizontal: space.lg,
    borderRadius: 6,
    alignItems: 'center',
    justifyContent: 'center',
    flexDirection: 'row',
    gap: space.sm,
    borderWidth: 1,
  },
  primary: { backgroundColor: colors.accent, borderColor: colors.accent },
  secondary: { backgroundColor: colors.surface, borderColor: colors.ink },
  danger: { backgroundColor: colors.fail, borderColor: colors.fail },
  pressed: { opacity: 0.85 },
  inactive: { opacity: 0.55 },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  label: { fontFamily: fonts.semibold, fontSize: 16 },
});
