import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { useSecondReviewsQuery } from '@/components/queries/second-reviews';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

// Accepted reviews drawn for calibration; scored blind by a second reviewer.
export function SecondReviewList() {
  const router = useRouter();
  const list = useSecondReviewsQuery(true);
  if (!list.data?.length) return null;
  return (
    <View style={styles.box} role="region" aria-label="Blind second reviews">
      <Text variant="heading" role="heading" aria-level={2}>
        Blind second reviews
      </Text>
      <Text variant="muted">Score these without seeing the first review; they measure how well reviewers agree.</Text>
      {list.data.map((item) => (
        <View key={item.id} style={styles.row}>
          <Text>{`${item.claimReference} · revision ${item.revision} · drawn ${formatDateTime(item.createdAt)}`}</Text>
          <Button
            label={`Score ${item.claimReference} blind`}
            tone="secondary"
            onPress={() => router.push(`/queue/${item.jobId}?second=${item.id}` as never)}
          />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  row: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
});
