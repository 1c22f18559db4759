// The frame of the public pages (sign-in's siblings): one card in the middle of the page.
import { ScrollView, StyleSheet, View } from 'react-native';

import { useDeferredFonts } from '@/components/ui/deferred-fonts';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export function PublicCard({ title, children }: { title: string; children: React.ReactNode }) {
  useDeferredFonts();
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.card} role="main">
        <Text variant="title" role="heading" aria-level={1}>
          {title}
        </Text>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flexGrow: 1, justifyContent: 'center', alignItems: 'center', padding: space.lg, backgroundColor: colors.paper },
  card: {
    width: '100%',
    maxWidth: 420,
    backgroundColor: colors.surface,
    borderRadius: 8,
    borderWidth: 1,
    borderColor: colors.line,
    borderTopWidth: 4,
    borderTopColor: colors.accent,
    padding: space.xl,
    gap: space.lg,
  },
});
