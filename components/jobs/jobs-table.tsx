import { useRouter } from 'expo-router';
import { useMemo } from 'react';
import { View } from 'react-native';

import { useRowSelection } from '@/components/lib/use-row-selection';
import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { selectColumn } from '@/components/ui/select-box';
import { CARDS_BELOW, space } from '@/components/ui/theme';
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
  const ids = useMemo(() => jobs.map((j) => j.id), [jobs]);
  const { selected, setSelected, toggle } = useRowSelection(ids);
  const tickColumn = useMemo(() => selectColumn<JobSummary>(selected, toggle), [selected, toggle]);
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
  const shown = useMemo(() => (selectable ? [tickColumn, ...columns] : columns), [selectable, tickColumn, columns]);
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
