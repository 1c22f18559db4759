import { Pressable, StyleSheet, View } from 'react-native';

import { chooseOnKeys } from '@/components/lib/press-keys';

import { FieldError } from './field-error';
import { Text } from './text';
import { colors, fonts, space } from './theme';

type Option<T extends string> = { value: T; label: string };

type Props<T extends string> = {
  label: string;
  options: Option<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
  error?: string;
};

// A row of radio buttons: every choice visible at once, which suits short enumerations on a phone.
export function ChoiceField<T extends string>({ label, options, value, onChange, error }: Props<T>) {
  return (
    <View style={styles.field} role="radiogroup" accessibilityLabel={label}>
      <Text variant="label">{label}</Text>
      <View style={styles.options}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              role="radio"
              accessibilityLabel={option.label}
              accessibilityState={{ checked: selected }}
              aria-checked={selected}
              onPress={() => onChange(option.value)}
              {...chooseOnKeys(() => onChange(option.value))}
              style={[styles.option, selected && styles.selected]}
            >
              <Text style={[styles.optionText, selected && styles.selectedText]}>
                {selected ? '● ' : '○ '}
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      <FieldError message={error} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, flexShrink: 1, maxWidth: '100%' },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    minHeight: 40,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: 6,
    borderWidth: 1,
    borderColor: colors.muted,
    backgroundColor: colors.surface,
  },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
  optionText: { fontFamily: fonts.regular, fontSize: 15, color: colors.ink },
  selectedText: { color: colors.surface, fontFamily: fonts.semibold },
});
