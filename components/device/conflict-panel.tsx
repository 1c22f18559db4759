// Two versions of one draft (a capture record, a visit plan): the technician's (on this phone)
// and the one saved meanwhile from another tab or device. Nothing is overwritten until the
// technician chooses.
import { useEffect, useRef } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export type Difference = { path: string; kind?: string; label: string; before: string; after: string };

type Props = {
  // What the draft is, in the title's words: "record", "plan".
  what: string;
  differences: Difference[];
  savedAt: string | null;
  onKeepMine: () => void;
  onUseTheirs: () => void;
};

export function ConflictPanel({ what, differences, savedAt, onKeepMine, onUseTheirs }: Props) {
  const ref = useRef<View>(null);
  // The technician may be far down the form: bring the choice into view (web: a DOM node).
  useEffect(() => {
    (ref.current as unknown as { scrollIntoView?: (o: object) => void } | null)?.scrollIntoView?.({ block: 'center' });
  }, []);
  const when = savedAt ? new Date(savedAt).toLocaleString([], { dateStyle: 'medium', timeStyle: 'short' }) : 'earlier';
  return (
    <View ref={ref} style={styles.box} role="alertdialog" aria-label={`Two versions of this ${what}`}>
      <Text variant="heading" role="heading" aria-level={2}>
        {`Two versions of this ${what}`}
      </Text>
      <Text>{`This ${what} was also saved from another tab or device (${when}). Your changes are kept on this phone until you choose.`}</Text>
      <Text variant="label">
        {differences.length ? `${differences.length} difference(s): saved version → yours` : 'The two versions hold the same facts.'}
      </Text>
      {differences.slice(0, 12).map((d) => (
        <Text key={`${d.path}-${d.kind}`} variant="small">{`${d.label}: saved ${d.before}, yours ${d.after}`}</Text>
      ))}
      {differences.length > 12 ? <Text variant="small">{`…and ${differences.length - 12} more.`}</Text> : null}
      <View style={styles.actions}>
        <Button label="Keep my version" onPress={onKeepMine} />
        <Button label="Use the saved version" tone="secondary" onPress={onUseTheirs} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, borderWidth: 2, borderColor: colors.rework, backgroundColor: colors.surface, borderRadius: 8, padding: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
