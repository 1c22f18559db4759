// A row's tick box in a table or card; the click's shift key is passed on for range selection.
import { Pressable, StyleSheet } from 'react-native';

import type { DataTableColumn } from './data-table';
import { Text } from './text';
import { colors, fonts } from './theme';

export function SelectBox({
  label,
  checked,
  onToggle,
}: {
  label: string;
  checked: boolean;
  onToggle: (on: boolean, shift: boolean) => void;
}) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      accessibilityLabel={label}
      onPress={(e) => {
        e.stopPropagation?.();
        onToggle(!checked, Boolean((e.nativeEvent as unknown as { shiftKey?: boolean }).shiftKey));
      }}
      style={[styles.box, checked && styles.boxOn]}
    >
      {checked ? <Text style={styles.tick}>✓</Text> : null}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  box: { width: 24, height: 24, borderWidth: 2, borderColor: colors.ink, borderRadius: 4, alignItems: 'center', justifyContent: 'center' },
  boxOn: { backgroundColor: colors.ink },
  tick: { color: colors.surface, fontFamily: fonts.bold, fontSize: 14 },
});

// The tick-box column of a table whose rows are jobs (Jobs, Queue), named by claim reference.
export function selectColumn<T extends { id: number; claimReference: string }>(
  selected: number[],
  toggle: (id: number, on: boolean, shift: boolean) => void,
): DataTableColumn<T> {
  return {
    id: 'select',
    header: 'Select',
    enableSorting: false,
    meta: { width: 64 },
    cell: ({ row }) => (
      <SelectBox
        label={`Select ${row.original.claimReference}`}
        checked={selected.includes(row.original.id)}
        onToggle={(on, shift) => toggle(row.original.id, on, shift)}
      />
    ),
  };
}
