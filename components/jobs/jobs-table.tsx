import { useRouter } from 'expo-router';
import { useCallback, useMemo, useRef, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import { CARDS_BELOW, colors, fonts, space } from '@/components/ui/theme';
import {
  JOB_SORT_DEFAULT_DIR,
  type JobSort,
  type JobSummary,
  LOSS_TYPE_LABELS,
  PRIORITY_LABELS,
  PROPERTY_TYPE_LABELS,
} from '@/shared/jobs';

import { BulkReassign } from './bulk-reassign';
import { DueText } from './due-text';
import { StatusBadge } from './status-badge';

type Sorted = { sort: JobSort; dir: 'asc' | 'desc' } | null;

// Sorted on the server: only the columns an index serves can be sorted.
export function JobsTable({
  jobs,
  sort,
  dir,
  onSort,
  selectable = false,
  filterTotal = 0,
  idsInFilter,
}: {
  jobs: JobSummary[];
  sort?: JobSort;
  dir?: 'asc' | 'desc';
  onSort: (next: Sorted) => void;
  // Managers select rows to move them together; shift-click selects a range.
  selectable?: boolean;
  // For "select all in this filter": how many match, and their ids.
  filterTotal?: number;
  idsInFilter?: () => Promise<number[]>;
}) {
  const router = useRouter();
  const [selected, setSelected] = useState<number[]>([]);
  const lastClicked = useRef<number | null>(null);
  const toggle = useCallback(
    (id: number, on: boolean, range: boolean) => {
      const ids = jobs.map((j) => j.id);
      const from = lastClicked.current === null ? -1 : ids.indexOf(lastClicked.current);
      const to = ids.indexOf(id);
      const span = range && from >= 0 ? ids.slice(Math.min(from, to), Math.max(from, to) + 1) : [id];
      lastClicked.current = id;
      setSelected((current) => (on ? [...new Set([...current, ...span])] : current.filter((s) => !span.includes(s))));
    },
    [jobs],
  );
  const selectColumn = useMemo<DataTableColumn<JobSummary>>(
    () => ({
      id: 'select',
      header: 'Select',
      enableSorting: false,
      meta: { width: 80 },
      cell: ({ row }) => (
        <SelectBox
          label={`Select ${row.original.claimReference}`}
          checked={selected.includes(row.original.id)}
          onToggle={(on, shift) => toggle(row.original.id, on, shift)}
        />
      ),
    }),
    [selected, toggle],
  );
  const columns = useMemo<DataTableColumn<JobSummary>[]>(
    () => [
      { id: 'claim', accessorKey: 'claimReference', header: 'Claim', meta: { width: 140 } },
      { id: 'address', accessorFn: (j) => `${j.street}, ${j.city}`, header: 'Property', enableSorting: false, meta: { width: 240 } },
      { id: 'technician', accessorFn: (j) => j.technician.name, header: 'Technician', meta: { width: 170 } },
      { id: 'lossType', accessorFn: (j) => LOSS_TYPE_LABELS[j.lossType], header: 'Loss', enableSorting: false, meta: { width: 90 } },
      {
        id: 'propertyType',
        accessorFn: (j) => PROPERTY_TYPE_LABELS[j.propertyType],
        header: 'Type',
        enableSorting: false,
        meta: { width: 150 },
      },
      { id: 'priority', accessorFn: (j) => PRIORITY_LABELS[j.priority], header: 'Priority', enableSorting: false, meta: { width: 110 } },
      {
        id: 'status',
        accessorKey: 'status',
        header: 'Status',
        enableSorting: false,
        meta: { width: 170 },
        cell: ({ row }) => <StatusBadge status={row.original.status} />,
      },
      { id: 'visit', accessorFn: (j) => j.siteVisitDate ?? '', header: 'Site visit', meta: { width: 120 } },
      { id: 'due', accessorKey: 'dueAt', header: 'Due', meta: { width: 190 }, cell: ({ row }) => <DueText job={row.original} /> },
    ],
    [],
  );
  const current = sort ?? 'due';
  const shown = useMemo(() => (selectable ? [selectColumn, ...columns] : columns), [selectable, selectColumn, columns]);
  return (
    <View style={{ gap: space.sm }}>
      {selectable ? (
        <BulkReassign
          selected={selected}
          pageCount={jobs.length}
          onSelectPage={() => setSelected(jobs.map((j) => j.id))}
          onClear={() => setSelected([])}
          filterTotal={filterTotal}
          onSelectFilter={async () => setSelected((await idsInFilter?.()) ?? [])}
        />
      ) : null}
      <DataTable
        label="Jobs"
        columns={shown}
        data={jobs}
        emptyText="No jobs match."
        getRowId={(j) => String(j.id)}
        sorting={[{ id: current, desc: (dir ?? JOB_SORT_DEFAULT_DIR[current]) === 'desc' }]}
        onSortingChange={(next) => onSort(next[0] ? { sort: next[0].id as JobSort, dir: next[0].desc ? 'desc' : 'asc' } : null)}
        onRowPress={(j) => router.push(`/jobs/${j.id}` as never)}
        cardsBelow={CARDS_BELOW}
        rowLabel={(j) => j.claimReference}
        columnChoice={{ storageKey: 'jobs', hiddenByDefault: ['propertyType', 'visit'] }}
      />
    </View>
  );
}

// A row's tick box; the click's shift key is passed on for range selection.
function SelectBox({ label, checked, onToggle }: { label: string; checked: boolean; onToggle: (on: boolean, shift: boolean) => void }) {
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
