import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useDisputeDecisionMutation, useDisputesQuery } from '@/components/queries/rework';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { type Dispute } from '@/shared/api-types';

// Rework items a technician disputed, for a manager to uphold or withdraw.
export function DisputesPanel() {
  const disputes = useDisputesQuery(true);
  return (
    <View style={styles.box} role="region" aria-label="Disputed rework items">
      <Text variant="heading" role="heading" aria-level={2}>
        Disputed rework items
      </Text>
      {!disputes.data?.length ? <Text variant="muted">No disputes waiting.</Text> : null}
      {(disputes.data ?? []).map((d) => (
        <DisputeRow key={d.id} dispute={d} />
      ))}
    </View>
  );
}

function DisputeRow({ dispute }: { dispute: Dispute }) {
  const decide = useDisputeDecisionMutation();
  const [note, setNote] = useState('');
  return (
    <View style={styles.item}>
      <Text variant="label">{`${dispute.claimReference} · ${dispute.title} · ${dispute.technician}`}</Text>
      <Text variant="small">{`Reviewer asked: ${dispute.instruction}`}</Text>
      <Text variant="small">{`Technician disputes: ${dispute.responseNote ?? ''}`}</Text>
      <TextField label={`Your note on ${dispute.claimReference} ${dispute.title}`} value={note} onChangeText={setNote} />
      <View style={styles.row}>
        <Button
          label="Uphold the item"
          tone="secondary"
          onPress={() => decide.mutate({ itemId: dispute.id, outcome: 'upheld', note })}
          busy={decide.isPending}
        />
        <Button
          label="Withdraw the item"
          tone="secondary"
          onPress={() => decide.mutate({ itemId: dispute.id, outcome: 'withdrawn', note })}
          busy={decide.isPending}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.xs },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
