// For a manager: give several selected records to one reviewer in one move (their claims move
// with them); the reviewer is told once.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useReassignMutation } from '@/components/queries/claims';
import { useReviewersQuery } from '@/components/queries/reviewers';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Select } from '@/components/ui/select';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export function MoveClaims({ selected, onClear }: { selected: number[]; onClear: () => void }) {
  const reviewers = useReviewersQuery(true);
  const reassign = useReassignMutation();
  const [to, setTo] = useState('');
  const [done, setDone] = useState<string | null>(null);
  if (selected.length === 0 && !done) return null;
  const name = reviewers.data?.find((r) => String(r.id) === to)?.name ?? 'the reviewer';
  const move = () =>
    reassign.mutate(
      { toReviewerId: Number(to), jobIds: selected },
      {
        onSuccess: (r) => {
          setDone(`${r.moved} record${r.moved === 1 ? '' : 's'} given to ${name}.`);
          onClear();
        },
      },
    );
  return (
    <View style={styles.bar} role="region" aria-label="Move selected claims">
      <Text role="status">{selected.length ? `${selected.length} selected (shift-click selects a range)` : ''}</Text>
      {selected.length ? (
        <View style={styles.row}>
          <Select
            label="Give to reviewer"
            value={to}
            allLabel="Choose…"
            options={(reviewers.data ?? []).map((r) => ({ value: String(r.id), label: r.name }))}
            onChange={setTo}
          />
          <Button label={`Give ${selected.length} to ${to ? name : 'reviewer'}`} onPress={move} disabled={!to} busy={reassign.isPending} />
          <Button label="Clear selection" tone="secondary" onPress={onClear} />
        </View>
      ) : null}
      {reassign.error ? <Notice tone="error">{reassign.error.message}</Notice> : null}
      {done && !reassign.error ? <Notice tone="info">{done}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm, padding: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: 8, backgroundColor: colors.surface },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
});
