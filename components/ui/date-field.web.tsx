// The browser's own date and time pickers (<input type="date|time|datetime-local">), styled
// like our text fields. The label is a real <label> for the input.
import { useId } from 'react';
import { StyleSheet, View } from 'react-native';

import type { DateFieldProps } from './date-field';
import { FieldError } from './field-error';
import { Text } from './text';
import { colors, fonts, space } from './theme';

export type { DateFieldProps };

export function DateField({ label, kind, value, onChange, onBlur, error, hint, min, max }: DateFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  return (
    <View style={styles.field}>
      <label htmlFor={id} style={{ fontFamily: fonts.semibold, color: colors.ink, fontSize: 15 }}>
        {label}
      </label>
      {hint ? (
        <Text variant="muted" nativeID={hintId}>
          {hint}
        </Text>
      ) : null}
      <input
        id={id}
        type={kind}
        value={value}
        min={min}
        max={max}
        aria-invalid={error ? true : undefined}
        aria-describedby={hint ? hintId : undefined}
        onChange={(event) => onChange(event.currentTarget.value)}
        onBlur={onBlur}
        style={{
          minHeight: 44,
          boxSizing: 'border-box',
          border: `${error ? 2 : 1}px solid ${error ? colors.fail : colors.muted}`,
          borderRadius: 6,
          padding: `0 ${space.md}px`,
          background: colors.surface,
          fontFamily: fonts.regular,
          fontSize: 16,
          color: colors.ink,
        }}
      />
      <FieldError message={error} />
    </View>
  );
}

const styles = StyleSheet.create({ field: { gap: space.xs } });
