import { Modal, Pressable, StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Text } from './text';
import { colors, fonts, space } from './theme';

export type KeyHelp = { keys: string; action: string }[];

export function HelpOverlay({ visible, title, keys, onClose }: { visible: boolean; title: string; keys: KeyHelp; onClose: () => void }) {
  return (
    <Modal visible={visible} transparent animationType="fade" onRequestClose={onClose}>
      <Pressable style={styles.backdrop} onPress={onClose} accessibilityLabel="Close keyboard help">
        <View style={styles.card} role="dialog" aria-label={title} aria-modal>
          <Text variant="heading" role="heading" aria-level={2}>
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
      </Pressable>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1, backgroundColor: 'rgba(27,36,48,0.5)', alignItems: 'center', justifyContent: 'center', padding: space.lg },
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
