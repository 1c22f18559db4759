import { Badge, type BadgeTone } from '@/components/ui/badge';
import { JOB_STATUS_LABELS, type JobStatus } from '@/shared/jobs';

const TONE: Record<JobStatus, BadgeTone> = {
  draft: 'neutral',
  submitted: 'accent',
  in_review: 'accent',
  rework_requested: 'rework',
  resubmitted: 'accent',
  accepted: 'pass',
  recapture_required: 'fail',
};

export function StatusBadge({ status }: { status: JobStatus }) {
  return <Badge label={JOB_STATUS_LABELS[status]} tone={TONE[status]} />;
}
