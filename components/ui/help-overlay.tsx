import { useEffect, useRef } from 'react';
import { Pressable, StyleSheet, type Text as RNText, View } from 'react-native';

import { Button } from './button';
import { Text } from './text';
import { colors, fonts, space } from './theme';

export type KeyHelp = { keys: string; action: string }[];

// One named dialog; the backdrop closes it on a click but is no control of its own (it is
// hidden from assistive technology and not focusable). Focus moves to the heading on opening.
export function HelpOverlay({ visible, title, keys, onClose }: { visible: boolean; title: string; keys: KeyHelp; onClose: () => void }) {
  const heading = useRef<RNText>(null);
  useEffect(() => {
    if (visible) setTimeout(() => (heading.current as unknown as { focus?: () => void } | null)?.focus?.(), 0);
  }, [visible]);
  return visible ? (
    <View style={styles.backdrop}>
      <Pressable style={StyleSheet.absoluteFill} onPress={onClose} focusable={false} aria-hidden tabIndex={-1} />
      <View style={styles.card} role="dialog" aria-label={title} aria-modal>
        <Text ref={heading} variant="heading" role="heading" aria-level={2} {...({ tabIndex: -1 } as object)}>
          {title}
        </Text>
        {keys.map((k) => (
          <View key={k.keys} style={styles.row}>
            <Text style={styles.key}>{k.keys}</Text>
            <Text style={{ flexShrink: 1 }}>{k.action}</Text>
          </View>
        ))}
        <Button label="Close" tone="secondary" onPress={onClose} />
      </View>
    </View>
  ) : null;
}

const styles = StyleSheet.create({
  // position: fixed exists on the web build, where the keys are used.
  backdrop: {
    position: 'fixed' as 'absolute',
    top: 0,
    left: 0,
    right: 0,
    bottom: 0,
    zIndex: 10,
    backgroundColor: 'rgba(27,36,48,0.5)',
    alignItems: 'center',
    justifyContent: 'center',
    padding: space.lg,
  },
  card: { backgroundColor: colors.surface, borderRadius: 8, padding: space.xl, gap: space.sm, width: '100%', maxWidth: 460 },
  row: { flexDirection: 'row', gap: space.md, alignItems: 'center' },
  key: {
    fontFamily: fonts.semibold,
    minWidth: 110,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 4,
    paddingHorizontal: 6,
    paddingVertical: 2,
    textAlign: 'center',
  },
});
