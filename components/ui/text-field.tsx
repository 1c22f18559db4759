import { forwardRef } from 'react';
import { StyleSheet, TextInput, type TextInputProps, View } from 'react-native';

import { FieldError } from './field-error';
import { Text } from './text';
import { colors, fonts, space } from './theme';

type Props = TextInputProps & { label: string; error?: string; hint?: string };

export const TextField = forwardRef<TextInput, Props>(function TextField({ label, error, hint, style, ...input }, ref) {
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={input.nativeID ? `${input.nativeID}-label` : undefined}>
        {label}
      </Text>
      {hint ? <Text variant="muted">{hint}</Text> : null}
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-invalid={error ? true : undefined}
        placeholderTextColor={colors.muted}
        style={[styles.input, error ? styles.inputError : null, style]}
        {...input}
      />
      <FieldError message={error} />
    </View>
  );
});

const styles = StyleSheet.create({
  field: { gap: space.xs },
  input: {
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.muted,
    borderRadius: 6,
    paddingHorizontal: space.md,
    backgroundColor: colors.surface,
    fontFamily: fonts.regular,
    fontSize: 16,
    color: colors.ink,
  },
  inputError: { borderColor: colors.fail, borderWidth: 2 },
});
