// In-app notifications: which timeline events tell whom, in what words, and whether each
// kind also goes by e-mail. Pure, so the server's fan-out and the preferences screen agree.
import type { Role } from './roles';

export const NOTIFICATION_KINDS = [
  'job_assigned',
  'rework_requested',
  'rework_reminder',
  'decision',
  'record_submitted',
  'dispute_raised',
  'claim_moved',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_LABELS: Record<NotificationKind, string> = {
  job_assigned: 'A job is assigned to me',
  rework_requested: 'Rework is requested on my record',
  rework_reminder: 'A rework deadline has passed',
  decision: 'My record is accepted, or needs a new site visit',
  record_submitted: 'A record is submitted or resubmitted for review',
  dispute_raised: 'A technician disputes a rework item',
  claim_moved: 'A claim is moved to me',
};

// Who can receive each kind: the preferences screen lists only these for a role.
export const NOTIFICATION_ROLES: Record<NotificationKind, Role[]> = {
  job_assigned: ['technician'],
  rework_requested: ['technician'],
  rework_reminder: ['technician'],
  decision: ['technician'],
  record_submitted: ['reviewer'],
  dispute_raised: ['manager'],
  claim_moved: ['reviewer'],
};

// E-mail defaults are what Sightline e-mailed before notifications existed.
export const EMAIL_BY_DEFAULT: Record<NotificationKind, boolean> = {
  job_assigned: false,
  rework_requested: true,
  rework_reminder: true,
  decision: true,
  record_submitted: false,
  dispute_raised: false,
  claim_moved: false,
};

// Kinds with an e-mail of their own (the rework request with its items, the reminder, the
// decision); the others, when someone turns e-mail on, get a short e-mail with the link.
export const OWN_EMAIL: ReadonlySet<NotificationKind> = new Set(['rework_requested', 'rework_reminder', 'decision']);

export const kindsFor = (role: Role) => NOTIFICATION_KINDS.filter((k) => NOTIFICATION_ROLES[k].includes(role));

export type Audience = { technician: true } | { role: 'reviewer' | 'manager' } | { userId: number };
export type EventNotice = { kind: NotificationKind; audience: Audience; text: string };

// The notice a timeline event raises, if any. `data` is the event's own data.
export function noticeForEvent(type: string, data: Record<string, unknown>, claimReference: string): EventNotice | null {
  switch (type) {
    case 'assigned':
      return { kind: 'job_assigned', audience: { technician: true }, text: `New job assigned to you: ${claimReference}` };
    case 'reassigned':
      return typeof data.to === 'number'
        ? { kind: 'job_assigned', audience: { userId: data.to }, text: `Job ${claimReference} is now assigned to you` }
        : null;
    case 'submitted':
      return {
        kind: 'record_submitted',
        audience: { role: 'reviewer' },
        text:
          Number(data.revision) > 1
            ? `Resubmitted for review: ${claimReference}, revision ${data.revision}`
            : `Submitted for review: ${claimReference}`,
      };
    case 'reviewed':
      if (data.hidden) return null;
      if (data.decision === 'rework')
        return { kind: 'rework_requested', audience: { technician: true }, text: `Rework requested on ${claimReference}` };
      if (data.decision === 'accept')
        return { kind: 'decision', audience: { technician: true }, text: `Accepted: ${claimReference}, revision ${data.revision}` };
      if (data.decision === 'recapture')
        return { kind: 'decision', audience: { technician: true }, text: `New site visit needed: ${claimReference}` };
      return null;
    case 'rework_answered':
      return data.response === 'disputed'
        ? { kind: 'dispute_raised', audience: { role: 'manager' }, text: `Dispute on ${claimReference}: "${String(data.title)}"` }
        : null;
    case 'claim_reassigned':
      return typeof data.to === 'number'
        ? { kind: 'claim_moved', audience: { userId: data.to }, text: `The claim on ${claimReference} was moved to you` }
        : null;
    default:
      return null;
  }
}

// One notice for a bulk move: "3 jobs are now assigned to you: A, B, C".
export function bulkMoveText(kind: 'job_assigned' | 'claim_moved', claimReferences: string[]): string {
  const listed = claimReferences.slice(0, 5).join(', ') + (claimReferences.length > 5 ? ', …' : '');
  if (kind === 'job_assigned')
    return claimReferences.length === 1
      ? `Job ${listed} is now assigned to you`
      : `${claimReferences.length} jobs are now assigned to you: ${listed}`;
  return claimReferences.length === 1
    ? `The claim on ${listed} was moved to you`
    : `${claimReferences.length} claims were moved to you: ${listed}`;
}

// Where a notification's link goes for the person reading it.
export function notificationHref(role: Role, jobId: number | null): string | null {
  if (jobId === null) return null;
  return role === 'reviewer' ? `/queue/${jobId}` : `/jobs/${jobId}`;
}

export type NotificationView = { id: number; kind: NotificationKind; text: string; jobId: number | null; createdAt: string; read: boolean };
export type NotificationList = { unread: number; items: NotificationView[] };
export type NotificationPref = { kind: NotificationKind; label: string; email: boolean };
