import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { colors, space } from './theme';

// A collapsible block of a long form; on a phone only the part being filled stays open.
export function Section({
  title,
  summary,
  initiallyOpen = true,
  children,
  testID,
}: {
  title: string;
  summary?: string;
  initiallyOpen?: boolean;
  children: React.ReactNode;
  testID?: string;
}) {
  const [open, setOpen] = useState(initiallyOpen);
  return (
    <View style={styles.section} testID={testID}>
      <Pressable
        role="button"
        // The name comes from the visible title and Hide/Show; the state from aria-expanded.
        aria-expanded={open}
        onPress={() => setOpen(!open)}
        style={styles.header}
      >
        <View style={{ flexShrink: 1 }}>
          <Text variant="heading" role="heading" aria-level={2}>
            {title}
          </Text>
          {summary ? <Text variant="muted">{summary}</Text> : null}
        </View>
        <Text variant="label">{open ? 'Hide ▲' : 'Show ▼'}</Text>
      </Pressable>
      {open ? <View style={styles.body}>{children}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8 },
  header: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', padding: space.lg, gap: space.md },
  body: { paddingHorizontal: space.lg, paddingBottom: space.lg, gap: space.md },
});
