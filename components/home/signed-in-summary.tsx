import { StyleSheet, View } from 'react-native';
import type { SessionUser } from '@/shared/api-types';
import { ROLE_LABELS } from '@/shared/roles';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

// Shown on a role's home until that role's own screen exists: who is signed in, as what.
export function SignedInSummary({ user, comingNext }: { user: SessionUser; comingNext: string }) {
  return (
    <View style={styles.card}>
      <Text variant="heading">Signed in as {user.name}</Text>
      <Text>
        Role: <Text variant="label">{ROLE_LABELS[user.role]}</Text> · {user.email}
      </Text>
      <Text variant="muted">{comingNext}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: 8, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.sm },
});
