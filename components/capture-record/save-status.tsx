// The save status, always in view on a phone (it sticks to the top while the form scrolls).
import { StyleSheet, View } from 'react-native';

import { describeSync, type SyncStatus } from '@/components/device/use-draft-sync';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';

const TONE: Record<SyncStatus['kind'], string> = {
  saved: colors.pass,
  pending: colors.muted,
  saving: colors.muted,
  offline: colors.rework,
  conflict: colors.fail,
  error: colors.fail,
};

export function SaveStatus({ status, problems }: { status: SyncStatus; problems: number }) {
  const tone = problems && status.kind === 'saved' ? colors.rework : TONE[status.kind];
  return (
    <View style={[styles.bar, { borderLeftColor: tone }]}>
      <Text role="status" aria-live="polite" style={{ fontFamily: fonts.semibold, color: colors.ink }}>
        {describeSync(status, problems)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  // position: sticky exists on the web build, which is what phones run.
  bar: {
    position: 'sticky' as 'relative',
    top: 0,
    zIndex: 2,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderLeftWidth: 6,
    borderRadius: 6,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
});
