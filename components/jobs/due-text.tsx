import { Text } from '@/components/ui/text';
import { colors, fonts } from '@/components/ui/theme';
import { describeDue, describeReworkDue, FINISHED_STATUSES, type JobSummary } from '@/shared/jobs';

type DueFacts = Pick<JobSummary, 'dueAt' | 'status'> & { reworkDueAt?: string | null };

export function DueText({ job, now = new Date() }: { job: DueFacts; now?: Date }) {
  const due = job.reworkDueAt
    ? describeReworkDue(job.reworkDueAt, now)
    : describeDue(job.dueAt, now, FINISHED_STATUSES.includes(job.status));
  const when = job.reworkDueAt
    ? ` (by ${new Date(job.reworkDueAt).toLocaleString([], { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' })})`
    : '';
  return (
    <Text variant="small" style={due.overdue ? { color: colors.fail, fontFamily: fonts.semibold } : undefined}>
      {`${due.overdue ? '⚠ ' : ''}${due.text}${when}`}
    </Text>
  );
}
