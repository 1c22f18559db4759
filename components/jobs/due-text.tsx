import { Text } from '@/components/ui/text';
import { colors, fonts } from '@/components/ui/theme';
import { describeDue, FINISHED_STATUSES, type JobSummary } from '@/shared/jobs';

export function DueText({ job, now = new Date() }: { job: Pick<JobSummary, 'dueAt' | 'status'>; now?: Date }) {
  const due = describeDue(job.dueAt, now, FINISHED_STATUSES.includes(job.status));
  return (
    <Text variant="small" style={due.overdue ? { color: colors.fail, fontFamily: fonts.semibold } : undefined}>
      {due.overdue ? `⚠ ${due.text}` : due.text}
    </Text>
  );
}
