import { useRouter } from 'expo-router';
import { useMemo } from 'react';

import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { type JobSummary, LOSS_TYPE_LABELS, PRIORITY_LABELS, PROPERTY_TYPE_LABELS } from '@/shared/jobs';

import { DueText } from './due-text';
import { StatusBadge } from './status-badge';

export function JobsTable({ jobs }: { jobs: JobSummary[] }) {
  const router = useRouter();
  const columns = useMemo<DataTableColumn<JobSummary>[]>(
    () => [
      { accessorKey: 'claimReference', header: 'Claim', meta: { width: 140 } },
      { id: 'address', accessorFn: (j) => `${j.street}, ${j.city}`, header: 'Property', meta: { width: 240 } },
      { id: 'technician', accessorFn: (j) => j.technician.name, header: 'Technician', meta: { width: 170 } },
      { id: 'lossType', accessorFn: (j) => LOSS_TYPE_LABELS[j.lossType], header: 'Loss', meta: { width: 90 } },
      { id: 'propertyType', accessorFn: (j) => PROPERTY_TYPE_LABELS[j.propertyType], header: 'Type', meta: { width: 150 } },
      { id: 'priority', accessorFn: (j) => PRIORITY_LABELS[j.priority], header: 'Priority', meta: { width: 150 } },
      { accessorKey: 'status', header: 'Status', meta: { width: 170 }, cell: ({ row }) => <StatusBadge status={row.original.status} /> },
      { accessorKey: 'dueAt', header: 'Due', meta: { width: 190 }, cell: ({ row }) => <DueText job={row.original} /> },
    ],
    [],
  );
  return (
    <DataTable
      label="Jobs"
      columns={columns}
      data={jobs}
      emptyText="No jobs match."
      getRowId={(j) => String(j.id)}
      initialSorting={[{ id: 'dueAt', desc: true }]}
      onRowPress={(j) => router.push(`/jobs/${j.id}` as never)}
    />
  );
}
