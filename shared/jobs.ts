import { type ClaimContacts, CONTACT_FIELDS } from './contacts';

// Job vocabulary shared by client, server, migrations and seeders.
export const JOB_STATUSES = [
  'draft',
  'submitted',
  'in_review',
  'rework_requested',
  'resubmitted',
  'accepted',
  'recapture_required',
] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  draft: 'Draft',
  submitted: 'Submitted',
  in_review: 'In review',
  rework_requested: 'Rework requested',
  resubmitted: 'Resubmitted',
  accepted: 'Accepted',
  recapture_required: 'Recapture required',
};

// States in which the technician may still edit and submit the capture record.
export const EDITABLE_STATUSES: JobStatus[] = ['draft', 'rework_requested'];

export const PROPERTY_TYPES = ['single_family', 'townhouse', 'condo_unit', 'manufactured_home'] as const;
export type PropertyType = (typeof PROPERTY_TYPES)[number];
export const PROPERTY_TYPE_LABELS: Record<PropertyType, string> = {
  single_family: 'Single-family',
  townhouse: 'Townhouse',
  condo_unit: 'Condo unit',
  manufactured_home: 'Manufactured home',
};

export const LOSS_TYPES = ['water', 'fire', 'smoke', 'wind', 'hail', 'other'] as const;
export type LossType = (typeof LOSS_TYPES)[number];
export const LOSS_TYPE_LABELS: Record<LossType, string> = {
  water: 'Water',
  fire: 'Fire',
  smoke: 'Smoke',
  wind: 'Wind',
  hail: 'Hail',
  other: 'Other',
};

export const PRIORITIES = ['normal', 'urgent', 'catastrophe'] as const;
export type Priority = (typeof PRIORITIES)[number];
export const PRIORITY_LABELS: Record<Priority, string> = {
  normal: 'Normal',
  urgent: 'Urgent',
  catastrophe: 'Catastrophe event',
};

// The facts of a job as a manager enters them (dates as ISO text).
export type JobFields = {
  claimReference: string;
  street: string;
  city: string;
  postcode: string;
  propertyType: PropertyType;
  lossType: LossType;
  lossDate: string;
  siteVisitDate: string | null;
  dueAt: string;
  priority: Priority;
};

// What POST /api/jobs takes: the job, who does it, and the claim's contacts.
export type JobInput = JobFields & ClaimContacts & { technicianId: number };

// The only fields a request may set on a new job; anything else in a body is ignored.
export const JOB_INPUT_FIELDS = [
  'claimReference',
  'street',
  'city',
  'postcode',
  'propertyType',
  'lossType',
  'lossDate',
  'siteVisitDate',
  'dueAt',
  'priority',
  'technicianId',
  ...CONTACT_FIELDS,
] as const satisfies readonly (keyof JobInput)[];

// What PATCH /api/jobs/:id may change.
export const UPDATABLE_JOB_FIELDS = ['technicianId', 'dueAt', 'priority', 'siteVisitDate', ...CONTACT_FIELDS] as const;

// Contacts are optional: blank or absent is "not known" (null).
export function pickContacts(body: Record<string, unknown>): ClaimContacts {
  return Object.fromEntries(
    CONTACT_FIELDS.map((field) => {
      const value = body[field];
      return [field, typeof value === 'string' && value.trim() ? value.trim() : null];
    }),
  ) as ClaimContacts;
}

export function pickJobInput(body: Record<string, unknown>): JobInput {
  const picked = Object.fromEntries(JOB_INPUT_FIELDS.map((field) => [field, body[field]]));
  return { ...picked, siteVisitDate: picked.siteVisitDate ?? null, ...pickContacts(body) } as JobInput;
}

export type JobSummary = JobFields & {
  id: number;
  status: JobStatus;
  technician: { id: number; name: string };
  revisionCount: number;
  // While rework is asked for: when the technician's answers are due.
  reworkDueAt: string | null;
};

// "Overdue by 2 days" / "Due in 5 hours": time left in words, never colour alone.
export function describeDue(dueAt: string | Date, now: Date, finished: boolean): { overdue: boolean; text: string } {
  const due = new Date(dueAt).getTime();
  const diff = due - now.getTime();
  if (finished) return { overdue: false, text: 'Delivered' };
  const span = humanSpan(Math.abs(diff));
  return diff < 0 ? { overdue: true, text: `Overdue by ${span}` } : { overdue: false, text: `Due in ${span}` };
}

// While rework is asked for, the delivery clock is paused and the technician's deadline is
// the one that matters: "Rework due in 20 hours" / "Rework overdue by 3 hours".
export function describeReworkDue(reworkDueAt: string | Date, now: Date): { overdue: boolean; text: string } {
  const diff = new Date(reworkDueAt).getTime() - now.getTime();
  const span = humanSpan(Math.abs(diff));
  return diff < 0 ? { overdue: true, text: `Rework overdue by ${span}` } : { overdue: false, text: `Rework due in ${span}` };
}

export function humanSpan(ms: number): string {
  const minutes = Math.round(ms / 60_000);
  if (minutes < 60) return plural(Math.max(minutes, 1), 'minute');
  const hours = Math.round(minutes / 60);
  if (hours < 48) return plural(hours, 'hour');
  return plural(Math.round(hours / 24), 'day');
}

function plural(n: number, word: string) {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export const FINISHED_STATUSES: JobStatus[] = ['accepted', 'recapture_required'];

// The job list's server-side sorts, each served by an index; the due date runs newest first.
export const JOB_SORTS = ['due', 'claim', 'technician', 'visit'] as const;
export type JobSort = (typeof JOB_SORTS)[number];
export const JOB_SORT_DEFAULT_DIR: Record<JobSort, 'asc' | 'desc'> = { due: 'desc', claim: 'asc', technician: 'asc', visit: 'desc' };

export type JobListQuery = {
  status?: JobStatus[];
  technicianId?: number;
  q?: string;
  sort?: JobSort;
  dir?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
};

// totalIsAtLeast: counting stopped at `total`; there are more.
export type JobPage = { jobs: JobSummary[]; total: number; totalIsAtLeast: boolean; page: number; pageSize: number };
