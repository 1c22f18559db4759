import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { useDeliveryQuery, useIssueLinkMutation, useRebuildSummaryMutation, useRevokeLinkMutation } from '@/components/queries/delivery';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

const LINK_STATE = { active: 'Open', expired: 'Expired', revoked: 'Withdrawn' } as const;
const BUILD_STATE = { pending: 'Being built', built: 'Built', failed: 'Not built (see the error)' } as const;

// A manager's view of what the adjuster got: the summary builds, the links, and the controls
// to rebuild, re-issue or withdraw. A new link is shown once, to copy; only its hash is kept.
export function DeliveryPanel({ jobId, canChange, hasAdjusterEmail }: { jobId: number; canChange: boolean; hasAdjusterEmail: boolean }) {
  const delivery = useDeliveryQuery(jobId);
  const rebuild = useRebuildSummaryMutation(jobId);
  const issue = useIssueLinkMutation(jobId);
  const revoke = useRevokeLinkMutation(jobId);
  const data = delivery.data;
  return (
    <View style={styles.card} role="region" aria-label="Delivery to the adjuster">
      <Text variant="heading" role="heading" aria-level={2}>
        Delivery to the adjuster
      </Text>
      {hasAdjusterEmail ? null : (
        <Notice tone="info">
          No adjuster e-mail on this job: the summary is built, but no link is sent. Add the e-mail, then issue a link.
        </Notice>
      )}
      {delivery.error ? <Notice tone="error">{delivery.error.message}</Notice> : null}
      {data ? (
        <>
          <Text>{data.summaryFileId ? 'The summary PDF is in the files below.' : 'No summary PDF yet.'}</Text>
          {data.deliveries.slice(0, 3).map((d) => (
            <Text
              key={d.id}
              variant="small"
            >{`${d.notify ? 'On acceptance' : 'Rebuild'} · ${formatDateTime(d.createdAt)} · ${BUILD_STATE[d.status]}${d.lastError ? `: ${d.lastError}` : ''}`}</Text>
          ))}
          <Text variant="label">Share links</Text>
          {data.links.length === 0 ? <Text variant="muted">No link issued yet.</Text> : null}
          {data.links.map((l) => (
            <View key={l.id} style={styles.link}>
              <Text variant="small">{`${LINK_STATE[l.state]} · issued ${formatDateTime(l.createdAt)} · ${l.state === 'revoked' ? `withdrawn ${formatDateTime(l.revokedAt!)}` : `until ${formatDateTime(l.expiresAt)}`}`}</Text>
              {canChange && l.state === 'active' ? (
                <Button label="Withdraw link" tone="secondary" busy={revoke.isPending} onPress={() => revoke.mutate(l.id)} />
              ) : null}
            </View>
          ))}
        </>
      ) : (
        <Text variant="muted">Loading…</Text>
      )}
      {issue.data ? <Notice tone="info">{`New link (copy it now; it is not shown again): ${issue.data.url}`}</Notice> : null}
      {issue.error ? <Notice tone="error">{issue.error.message}</Notice> : null}
      {rebuild.error ? <Notice tone="error">{rebuild.error.message}</Notice> : null}
      {canChange ? (
        <View style={styles.actions}>
          <Button label="Rebuild the summary" tone="secondary" busy={rebuild.isPending} onPress={() => rebuild.mutate()} />
          <Button label="Issue a new link (ends the current one)" tone="secondary" busy={issue.isPending} onPress={() => issue.mutate()} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  link: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
