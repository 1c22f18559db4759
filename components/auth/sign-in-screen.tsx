import { ScrollView, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

import { SignInForm } from './sign-in-form';

export function SignInScreen() {
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.card} role="main">
        <Text variant="title" role="heading" aria-level={1}>
          Sightline
        </Text>
        <Text variant="muted">Quality control for 3D captures of damaged homes. Sign in with your work e-mail.</Text>
        <SignInForm />
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
