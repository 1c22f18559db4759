import { useRouter } from 'expo-router';
import { useMemo } from 'react';

import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import type { TeamRow } from '@/shared/trends';
import { timeOnSiteText } from '@/shared/visit-suggestions';

import { formatRate, intervalText } from './format';

// One row per technician; small numbers show an interval or "too few reviews", never a bare rate.
export function TeamTable({ rows, weeks }: { rows: TeamRow[]; weeks: string }) {
  const router = useRouter();
  const columns = useMemo<DataTableColumn<TeamRow>[]>(
    () => [
      { id: 'technician', accessorFn: (r) => r.technician.name, header: 'Technician', meta: { width: 180 } },
      { accessorKey: 'reviews', header: 'Reviews', meta: { width: 100 } },
      {
        id: 'meanScore',
        accessorFn: (r) => r.meanScore ?? -1,
        header: 'Mean score',
        meta: { width: 120 },
        cell: ({ row }) => <Text variant="small">{row.original.meanScore?.toFixed(1) ?? '–'}</Text>,
      },
      {
        id: 'fpy',
        accessorFn: (r) => r.firstPassYield.interval?.estimate ?? -1,
        header: 'First-pass yield (95 % interval)',
        meta: { width: 240 },
        cell: ({ row }) => {
          const f = row.original.firstPassYield;
          return (
            <Text variant="small">
              {f.total === 0
                ? 'No first reviews'
                : `${formatRate(f.interval!.estimate)} (${intervalText(f.interval)}) of ${f.total}${row.original.tooFew ? ' · too few reviews' : ''}`}
            </Text>
          );
        },
      },
      {
        id: 'rework',
        accessorFn: (r) => r.reworkRate ?? -1,
        header: 'Rework rate',
        meta: { width: 120 },
        cell: ({ row }) => <Text variant="small">{row.original.tooFew ? 'too few reviews' : formatRate(row.original.reworkRate)}</Text>,
      },
      { accessorKey: 'recaptures', header: 'Recaptures', meta: { width: 110 } },
      {
        id: 'revisions',
        accessorFn: (r) => r.meanRevisionsToAcceptance ?? -1,
        header: 'Revisions to accept',
        meta: { width: 150 },
        cell: ({ row }) => <Text variant="small">{row.original.meanRevisionsToAcceptance?.toFixed(2) ?? '–'}</Text>,
      },
      {
        id: 'hours',
        accessorFn: (r) => r.medianHoursVisitToAcceptance ?? -1,
        header: 'Visit to acceptance',
        meta: { width: 160 },
        cell: ({ row }) => (
          <Text variant="small">
            {row.original.medianHoursVisitToAcceptance === null ? '–' : `${Math.round(row.original.medianHoursVisitToAcceptance)} h median`}
          </Text>
        ),
      },
      {
        id: 'timeOnSite',
        accessorFn: (r) => r.visits.timed,
        header: 'Time on site, planned vs actual',
        meta: { width: 230 },
        cell: ({ row }) => <Text variant="small">{timeOnSiteText(row.original.visits)}</Text>,
      },
    ],
    [],
  );
  return (
    <DataTable
      label="Technicians compared"
      columns={columns}
      data={rows}
      emptyText="No technicians."
      getRowId={(r) => String(r.technician.id)}
      initialSorting={[{ id: 'technician', desc: false }]}
      onRowPress={(r) => router.push(`/trends/technicians/${r.technician.id}?weeks=${weeks}` as never)}
    />
  );
}
