import type { Ref } from 'react';
import { Text as RNText, type TextProps } from 'react-native';

import { colors, fonts } from './theme';

type Variant = 'body' | 'title' | 'heading' | 'label' | 'muted' | 'small';

const styles: Record<Variant, object> = {
  body: { fontFamily: fonts.regular, fontSize: 16, color: colors.ink },
  title: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  heading: { fontFamily: fonts.semibold, fontSize: 18, color: colors.ink },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  muted: { fontFamily: fonts.regular, fontSize: 14, color: colors.muted },
  small: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
};

// React 19 passes ref as a prop: a heading can take focus (help dialog, scoring screen).
export function Text({ variant = 'body', style, ...props }: TextProps & { variant?: Variant; ref?: Ref<RNText> }) {
  return <RNText {...props} style={[styles[variant], style]} />;
}
