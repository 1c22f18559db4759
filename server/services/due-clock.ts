import type { Job } from '../models';

// The delivery clock stops while a job waits on the technician for rework, and starts again
// on resubmission: the stopped time is added to the effective due time.
export function pauseDueClock(job: Job, at: Date) {
  if (!job.pausedAt) job.pausedAt = at;
}

export function resumeDueClock(job: Job, at: Date) {
  if (!job.pausedAt) return;
  job.pausedMs = job.pausedMs + Math.max(0, at.getTime() - job.pausedAt.getTime());
  job.pausedAt = null;
  job.effectiveDueAt = new Date(job.dueAt.getTime() + job.pausedMs);
}
