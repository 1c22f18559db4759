import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useReassignMutation } from '@/components/queries/claims';
import { useReviewersQuery } from '@/components/queries/reviewers';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Select } from '@/components/ui/select';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

// For a manager covering an absent reviewer: move all of their live claims at once.
export function ReassignPanel() {
  const reviewers = useReviewersQuery(true);
  const reassign = useReassignMutation();
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const options = (reviewers.data ?? []).map((r) => ({ value: String(r.id), label: r.name }));
  return (
    <View style={styles.box} role="region" aria-label="Reassign claims">
      <Text variant="heading" role="heading" aria-level={2}>
        Reassign claims
      </Text>
      <View style={styles.row}>
        <Select label="From reviewer" value={from} options={options} onChange={setFrom} allLabel="Choose…" />
        <Select label="To reviewer" value={to} options={options.filter((o) => o.value !== from)} onChange={setTo} allLabel="Choose…" />
        <Button
          label="Move their claims"
          tone="secondary"
          disabled={!from || !to}
          busy={reassign.isPending}
          onPress={() => reassign.mutate({ fromReviewerId: Number(from), toReviewerId: Number(to) })}
        />
      </View>
      {reassign.data ? <Notice tone="info">{`${reassign.data.moved} claim(s) moved.`}</Notice> : null}
      {reassign.error ? <Notice tone="error">{reassign.error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-end' },
});
