// The manager's bar for moving several selected jobs to one technician at once.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { BULK_MOVE_MAX, useReassignJobsMutation } from '@/components/queries/jobs';
import { useTechniciansQuery } from '@/components/queries/technicians';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Select } from '@/components/ui/select';
import { Text } from '@/components/ui/text';
import { colors, space } from '@/components/ui/theme';

export function BulkReassign({
  selected,
  pageCount,
  onSelectPage,
  onClear,
  filterTotal,
  onSelectFilter,
}: {
  selected: number[];
  pageCount: number;
  onSelectPage: () => void;
  onClear: () => void;
  // How many jobs match the current filter (very large when the count was capped).
  filterTotal: number;
  onSelectFilter: () => Promise<void>;
}) {
  const [selecting, setSelecting] = useState(false);
  const technicians = useTechniciansQuery();
  const reassign = useReassignJobsMutation();
  const [technicianId, setTechnicianId] = useState('');
  const [done, setDone] = useState<string | null>(null);
  const move = () =>
    reassign.mutate(
      { jobIds: selected, technicianId: Number(technicianId) },
      {
        onSuccess: (r) => {
          const name = technicians.data?.find((t) => String(t.id) === technicianId)?.name ?? 'the technician';
          setDone(`${r.moved} job${r.moved === 1 ? '' : 's'} moved to ${name}.`);
          onClear();
        },
      },
    );
  const error = reassign.error as (Error & { fields?: Record<string, string> }) | null;
  return (
    <View style={styles.bar} role="region" aria-label="Move selected jobs">
      <Text role="status">
        {selected.length ? `${selected.length} selected (shift-click selects a range)` : 'Select jobs to move them together'}
      </Text>
      <View style={styles.row}>
        <Button label={`Select all ${pageCount} on this page`} tone="secondary" onPress={onSelectPage} />
        {filterTotal > pageCount && filterTotal <= BULK_MOVE_MAX ? (
          <Button
            label={`Select all ${filterTotal} in this filter`}
            tone="secondary"
            busy={selecting}
            onPress={() => {
              setSelecting(true);
              void onSelectFilter().finally(() => setSelecting(false));
            }}
          />
        ) : null}
        {filterTotal > BULK_MOVE_MAX ? (
          <Text variant="muted">{`Narrow the filter to select all: at most ${BULK_MOVE_MAX} move at once.`}</Text>
        ) : null}
        {selected.length ? <Button label="Clear selection" tone="secondary" onPress={onClear} /> : null}
      </View>
      {selected.length ? (
        <View style={styles.row}>
          <Select
            label="Move to technician"
            value={technicianId}
            allLabel="Choose…"
            options={(technicians.data ?? []).map((t) => ({ value: String(t.id), label: t.name }))}
            onChange={(v) => setTechnicianId(v)}
          />
          <Button
            label={`Move ${selected.length} job${selected.length === 1 ? '' : 's'}`}
            onPress={move}
            disabled={!technicianId}
            busy={reassign.isPending}
          />
        </View>
      ) : null}
      {error ? <Notice tone="error">{error.fields?.jobIds ?? error.fields?.technicianId ?? error.message}</Notice> : null}
      {done && !error ? <Notice tone="info">{done}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm, padding: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: 8, backgroundColor: colors.surface },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
});
