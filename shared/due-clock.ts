// The delivery clock stops while a job waits on the technician for rework, and starts again on
// resubmission: the stopped time is added to the effective due time. Pure, so the queue, the
// job page and the server all compute the same times.
export type DueClock = { dueAt: Date; pausedAt: Date | null; pausedMs: number; effectiveDueAt: Date };

const HOUR_MS = 3_600_000;

export function effectiveDueAt(dueAt: Date, pausedMs: number): Date {
  return new Date(dueAt.getTime() + pausedMs);
}

export function pauseDueClock(clock: DueClock, at: Date): void {
  if (!clock.pausedAt) clock.pausedAt = at;
}

export function resumeDueClock(clock: DueClock, at: Date): void {
  if (!clock.pausedAt) return;
  clock.pausedMs = clock.pausedMs + Math.max(0, at.getTime() - clock.pausedAt.getTime());
  clock.pausedAt = null;
  clock.effectiveDueAt = effectiveDueAt(clock.dueAt, clock.pausedMs);
}

// When the technician's answers to a rework request are due.
export function reworkDueAt(requestedAt: Date, reworkHours: number): Date {
  return new Date(requestedAt.getTime() + reworkHours * HOUR_MS);
}

// The latest request time whose rework is overdue at `now`.
export function reworkOverdueCutoff(now: Date, reworkHours: number): Date {
  return new Date(now.getTime() - reworkHours * HOUR_MS);
}
