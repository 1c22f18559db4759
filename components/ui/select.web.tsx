import { createElement } from 'react';
import { View } from 'react-native';

import type { SelectProps } from './select';
import { Text } from './text';
import { colors, fonts } from './theme';

export type { SelectProps };

// A native <select>: compact, keyboard-friendly and announced properly by screen readers.
export function Select<T extends string>({ label, value, options, onChange, allLabel = 'All' }: SelectProps<T>) {
  return (
    <View style={{ gap: 4, minWidth: 150 }}>
      <Text variant="label">{label}</Text>
      {createElement(
        'select',
        {
          'aria-label': label,
          value,
          onChange: (e: { target: { value: string } }) => onChange(e.target.value as T | ''),
          style: {
            minHeight: 40,
            borderRadius: 6,
            border: `1px solid ${colors.muted}`,
            padding: '0 8px',
            fontSize: 15,
            fontFamily: fonts.regular,
            background: colors.surface,
            color: colors.ink,
          },
        },
        createElement('option', { value: '' }, allLabel),
        ...options.map((o) => createElement('option', { key: o.value, value: o.value }, o.label)),
      )}
    </View>
  );
}
