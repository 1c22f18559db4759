import { ScrollView, StyleSheet, View } from 'react-native';

import { useDeferredFonts } from './deferred-fonts';
import { Text } from './text';
import { space } from './theme';

// The frame of every page: a heading (the page's accessible name) and scrollable content.
export function Screen({
  title,
  subtitle,
  actions,
  children,
}: {
  title: string;
  subtitle?: string;
  actions?: React.ReactNode;
  children: React.ReactNode;
}) {
  useDeferredFonts();
  return (
    <ScrollView contentContainerStyle={styles.content}>
      <View style={styles.header}>
        <View style={{ flexShrink: 1 }}>
          <Text variant="title" role="heading" aria-level={1}>
            {title}
          </Text>
          {subtitle ? <Text variant="muted">{subtitle}</Text> : null}
        </View>
        {actions}
      </View>
      {children}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  content: { padding: space.lg, gap: space.lg, maxWidth: 1400, width: '100%', alignSelf: 'center' },
  header: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md, flexWrap: 'wrap' },
});
