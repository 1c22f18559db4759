// Who holds the claim on this record, and the actions that go with it.
import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { useClaimMutation, useReleaseMutation, useSecondClaimMutation } from '@/components/queries/claims';
import { useSessionQuery } from '@/components/queries/session';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';
import type { Workspace } from '@/shared/review';

import { ReassignOne } from './reassign-one';

export function ClaimBar({ workspace, holdsClaim }: { workspace: Workspace; holdsClaim: boolean }) {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const claim = useClaimMutation();
  const secondClaim = useSecondClaimMutation();
  const release = useReleaseMutation();
  const { job } = workspace;
  const second = workspace.secondReviewId;

  if (holdsClaim) {
    if (second !== null) return null;
    const until = workspace.claimExpiresAt
      ? ` until ${new Date(workspace.claimExpiresAt).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })} (extended while you work)`
      : '';
    return (
      <View style={styles.claimBar}>
        <Text>{`You hold the claim${until}.`}</Text>
        <Button
          label="Release claim"
          tone="secondary"
          onPress={() => release.mutate(job.id, { onSuccess: () => router.replace('/queue') })}
        />
      </View>
    );
  }
  // A live claim by someone else: say who holds it rather than offer a claim that would fail.
  const heldByOther = second === null && job.claimedBy !== null && job.claimedBy.id !== me?.id;
  return (
    <View style={styles.claimBar}>
      <Text>
        {second !== null
          ? 'Claim this blind review before scoring it.'
          : heldByOther
            ? `${job.claimedBy!.name} holds the claim on this record. It comes free when they release it or their claim lapses.`
            : 'Nobody has claimed this job yet.'}
      </Text>
      {me?.role === 'reviewer' && !heldByOther ? (
        <Button
          label="Claim to score"
          onPress={() => (second !== null ? secondClaim.mutate(second) : claim.mutate(job.id))}
          busy={claim.isPending || secondClaim.isPending}
        />
      ) : null}
      {secondClaim.error ? <Notice tone="error">{secondClaim.error.message}</Notice> : null}
      {me?.role === 'manager' && second === null ? <ReassignOne jobId={job.id} currentId={job.claimedBy?.id ?? null} /> : null}
      {claim.error ? <Notice tone="error">{claim.error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  claimBar: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    flexWrap: 'wrap',
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.md,
  },
});
