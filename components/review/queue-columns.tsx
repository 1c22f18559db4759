import { StatusBadge } from '@/components/jobs/status-badge';
import type { DataTableColumn } from '@/components/ui/data-table';
import { Text } from '@/components/ui/text';
import { colors, fonts } from '@/components/ui/theme';
import { CAMERA_CLASS_LABELS } from '@/shared/capture-record';
import { describeDue, humanSpan, LOSS_TYPE_LABELS, PRIORITY_LABELS, PROPERTY_TYPE_LABELS } from '@/shared/jobs';
import type { QueueRow } from '@/shared/review';
import { riskWords } from '@/shared/risk-hint';

// At 1440 px the default columns fit the page without scrolling sideways; the others are a
// tick away under "Columns". The revision shows in the state ("Resubmitted") by default.
export const QUEUE_HIDDEN_BY_DEFAULT = ['propertyType', 'cameraClass', 'submitted', 'revision'];

export function queueColumns(now: Date, meId: number | undefined): DataTableColumn<QueueRow>[] {
  return [
    { id: 'claim', accessorKey: 'claimReference', header: 'Claim', meta: { width: 130 } },
    { id: 'technician', accessorFn: (r) => r.technician.name, header: 'Technician', meta: { width: 160 } },
    {
      id: 'propertyType',
      accessorFn: (r) => PROPERTY_TYPE_LABELS[r.propertyType],
      header: 'Property',
      enableSorting: false,
      meta: { width: 130 },
    },
    { id: 'lossType', accessorFn: (r) => LOSS_TYPE_LABELS[r.lossType], header: 'Loss', enableSorting: false, meta: { width: 80 } },
    {
      id: 'cameraClass',
      accessorFn: (r) => (r.cameraClass ? CAMERA_CLASS_LABELS[r.cameraClass] : '–'),
      header: 'Camera',
      enableSorting: false,
      meta: { width: 170 },
    },
    {
      id: 'revision',
      accessorFn: (r) => (r.revision > 1 ? `Resubmission (rev ${r.revision})` : 'First (rev 1)'),
      header: 'Revision',
      meta: { width: 130 },
    },
    {
      id: 'submitted',
      accessorKey: 'submittedAt',
      header: 'Submitted',
      meta: { width: 150 },
      cell: ({ row }) => (
        <Text variant="small">
          {row.original.submittedAt ? `${humanSpan(now.getTime() - new Date(row.original.submittedAt).getTime())} ago` : '–'}
        </Text>
      ),
    },
    {
      id: 'due',
      accessorKey: 'dueAt',
      header: 'Due / time left',
      meta: { width: 190 },
      cell: ({ row }) => {
        const due = describeDue(row.original.dueAt, now, false);
        const paused = row.original.waitingOn === 'technician';
        return (
          <Text variant="small" style={due.overdue ? { color: colors.fail, fontFamily: fonts.semibold } : undefined}>
            {paused ? `Clock paused · ${due.text.toLowerCase()}` : due.overdue ? `⚠ ${due.text}` : due.text}
          </Text>
        );
      },
    },
    { id: 'priority', accessorFn: (r) => PRIORITY_LABELS[r.priority], header: 'Priority', meta: { width: 110 } },
    {
      // The rework-risk hint: words and the percentage; a dash while the model is withheld.
      id: 'risk',
      accessorFn: (r) => riskWords(r.risk),
      header: 'Likely to come back',
      meta: { width: 130 },
    },
    {
      id: 'status',
      accessorKey: 'status',
      header: 'State · whose turn',
      enableSorting: false,
      meta: { width: 210 },
      cell: ({ row }) => (
        <>
          <StatusBadge status={row.original.status} />
          <Text variant="muted">{row.original.waitingOn === 'reviewer' ? 'Waiting on a reviewer' : 'Waiting on the technician'}</Text>
        </>
      ),
    },
    {
      id: 'claimedBy',
      accessorFn: (r) => r.claimedBy?.name ?? '',
      header: 'Claimed by',
      enableSorting: false,
      meta: { width: 160 },
      cell: ({ row }) => (
        <Text variant="small">
          {row.original.claimedBy ? (row.original.claimedBy.id === meId ? 'You' : row.original.claimedBy.name) : 'Nobody'}
        </Text>
      ),
    },
  ];
}
