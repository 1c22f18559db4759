// Shown once a decision is recorded: what happened, and the way on to the next record in the
// same queue filter, so a reviewer goes from record to record without the queue in between.
import { useRouter } from 'expo-router';
import { useEffect, useRef } from 'react';
import { StyleSheet, View } from 'react-native';

import { useClaimNextMutation } from '@/components/queries/claims';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export function DecisionDone({ message, queueFilter }: { message: string; queueFilter: string }) {
  const router = useRouter();
  const next = useClaimNextMutation();
  const heading = useRef<View>(null);
  useEffect(() => {
    (heading.current as unknown as HTMLElement | null)?.focus?.();
  }, []);
  const claimNext = () =>
    next.mutate(queueFilter, {
      onSuccess: (r) => {
        if (r.found && r.jobId) router.replace(`/queue/${r.jobId}?from=${encodeURIComponent(queueFilter)}` as never);
      },
    });
  const backToQueue = () => router.replace((queueFilter ? `/queue?${queueFilter.replace(/(^|&)pageSize=\d+/, '')}` : '/queue') as never);
  return (
    <View style={styles.box} role="region" aria-label="Decision recorded">
      <View ref={heading} {...({ tabIndex: -1 } as object)}>
        <Text variant="heading" role="heading" aria-level={2}>
          Decision recorded
        </Text>
      </View>
      <Text role="status">{message}</Text>
      {next.data && !next.data.found ? <Notice tone="info">Nothing else in this queue filter is free to claim. Well done.</Notice> : null}
      {next.error ? <Notice tone="error">{next.error.message}</Notice> : null}
      <View style={styles.row}>
        <Button label="Claim next" onPress={claimNext} busy={next.isPending} disabled={next.data?.found === false} />
        <Button label="Back to the queue" tone="secondary" onPress={backToQueue} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderWidth: 2, borderColor: colors.pass, borderRadius: 8, padding: space.lg, gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
