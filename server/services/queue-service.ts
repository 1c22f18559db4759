import type { JobStatus } from '../../shared/jobs';
import { QUEUE_STATUSES, type QueueFilters, type QueuePage, type QueueRow, type QueueSort } from '../../shared/review';
import type { Job, User } from '../models';
import { countJobs, isoTime, type JobPageQuery, pageOfJobs, resolveSearch, stateCounts } from './job-page-query';

type Actor = Express.User;

const DEFAULT_STATUSES: JobStatus[] = ['submitted', 'in_review', 'resubmitted'];

export function activeClaim(job: Pick<Job, 'claimedById' | 'claimExpiresAt'>, now = new Date()) {
  return job.claimedById !== null && job.claimExpiresAt !== null && job.claimExpiresAt > now;
}

export function toQueueRow(job: Job, now = new Date()): QueueRow {
  const claimant = job.get('claimedBy') as User | null | undefined;
  return {
    id: job.id,
    claimReference: job.claimReference,
    technician: { id: job.technician!.id, name: job.technician!.name },
    propertyType: job.propertyType,
    lossType: job.lossType,
    cameraClass: job.cameraClass,
    revision: job.currentRevision,
    submittedAt: job.submittedAt ? job.submittedAt.toISOString() : null,
    dueAt: job.effectiveDueAt.toISOString(),
    priority: job.priority,
    status: job.status,
    claimedBy: activeClaim(job, now) && claimant ? { id: claimant.id, name: claimant.name } : null,
    waitingOn: job.status === 'rework_requested' ? 'technician' : 'reviewer',
    pausedMs: job.pausedMs,
    risk: job.riskProbability ?? null,
  };
}

// Each sort's columns, and the index that serves it over the whole queue.
const QUEUE_ORDERS: Record<QueueSort, { columns: string[]; index: string }> = {
  due: { columns: ['effective_due_at', 'priority_rank', 'id'], index: 'jobs_queue_due' },
  submitted: { columns: ['submitted_at', 'id'], index: 'jobs_queue_submitted' },
  claim: { columns: ['claim_reference'], index: 'jobs_queue_claim' },
  technician: { columns: ['technician_name', 'effective_due_at', 'id'], index: 'jobs_queue_technician_name' },
  priority: { columns: ['priority_rank', 'effective_due_at', 'id'], index: 'jobs_queue_priority' },
  revision: { columns: ['current_revision', 'effective_due_at', 'id'], index: 'jobs_queue_revision' },
  risk: { columns: ['risk_probability', 'effective_due_at', 'id'], index: 'jobs_queue_risk' },
};

// Every column of an order runs the same way, so one index serves it, read forwards or
// backwards. The default is by due time (overdue records come first by that alone), then
// the most urgent priority.
function orderFor(sort: QueueSort | undefined, dir: 'asc' | 'desc') {
  const direction = dir === 'desc' ? 'DESC' : 'ASC';
  return QUEUE_ORDERS[sort ?? 'due'].columns.map((column) => `j.${column} ${direction}`);
}

function conditionsFor(actor: Actor, filters: QueueFilters) {
  const conditions: string[] = [];
  const params: Record<string, unknown> = {};
  const statuses = filters.status?.length ? filters.status : DEFAULT_STATUSES;
  const isDefault = statuses.length === DEFAULT_STATUSES.length && DEFAULT_STATUSES.every((s) => statuses.includes(s));
  if (isDefault) conditions.push('j.queue_open = 1');
  else {
    conditions.push('j.status IN (:statuses)');
    params.statuses = statuses;
  }
  const equal = (column: string, key: string, value: unknown) => {
    if (value === undefined) return;
    conditions.push(`j.${column} = :${key}`);
    params[key] = value;
  };
  equal('technician_id', 'technicianId', filters.technicianId);
  equal('loss_type', 'lossType', filters.lossType);
  equal('priority', 'priority', filters.priority);
  equal('camera_class', 'cameraClass', filters.cameraClass);
  if (filters.submission === 'first') conditions.push('j.current_revision = 1');
  if (filters.submission === 'resubmission') conditions.push('j.current_revision > 1');
  if (filters.claimedByMe) {
    conditions.push('j.claimed_by_id = :me AND j.claim_expires_at > UTC_TIMESTAMP(3)');
    params.me = actor.id;
  }
  return { conditions, params, isDefault: isDefault && conditions.length === 1 };
}

// The index for a filter and sort: the queue's own for the whole queue, the technician's or
// the state's by due time; other combinations are small enough for the planner to choose.
function indexFor(filters: QueueFilters, sort: QueueSort, wholeQueue: boolean, search?: string) {
  if (search) return undefined;
  if (wholeQueue) return QUEUE_ORDERS[sort].index;
  const others = [filters.lossType, filters.priority, filters.cameraClass, filters.submission, filters.claimedByMe || undefined];
  if (sort !== 'due' || others.some((v) => v !== undefined)) return undefined;
  if (filters.technicianId && !filters.status?.length) return 'jobs_queue_by_technician';
  if (!filters.technicianId && filters.status?.length === 1) return 'jobs_status_due_order';
  return undefined;
}

export type QueueParamsIn = {
  page: number;
  pageSize: number;
  sort?: QueueSort;
  dir: 'asc' | 'desc';
  filters: QueueFilters;
  search?: string;
};

export function queuePageQuery(actor: Actor, params: QueueParamsIn) {
  const { conditions, params: values, isDefault } = conditionsFor(actor, params.filters);
  const sort = params.sort ?? 'due';
  const page: JobPageQuery = {
    conditions,
    params: values,
    search: params.search,
    orderBy: orderFor(sort, params.dir),
    limit: params.pageSize,
    offset: (params.page - 1) * params.pageSize,
    index: indexFor(params.filters, sort, isDefault, params.search),
  };
  return { page, wholeQueue: isDefault && !params.search };
}

// Counts per state for the whole queue, ignoring the filters: the counts the jobs triggers keep.
async function queueStateCounts() {
  return stateCounts(QUEUE_STATUSES);
}

// The queue page's columns and joins: everything a row shows, in the one statement.
export const QUEUE_SELECT = `j.id, j.claim_reference, j.property_type, j.loss_type, j.camera_class, j.current_revision, j.submitted_at,
  j.effective_due_at, j.priority, j.status, j.paused_ms, j.claimed_by_id, j.claim_expires_at, j.risk_probability,
  t.id AS technician_id, t.name AS technician_name, c.name AS claimed_by_name`;
export const QUEUE_JOINS = 'JOIN users t ON t.id = j.technician_id LEFT JOIN users c ON c.id = j.claimed_by_id';
type QueueSqlRow = {
  id: number;
  claim_reference: string;
  property_type: QueueRow['propertyType'];
  loss_type: QueueRow['lossType'];
  camera_class: QueueRow['cameraClass'];
  current_revision: number;
  submitted_at: Date | null;
  effective_due_at: Date;
  priority: QueueRow['priority'];
  status: JobStatus;
  paused_ms: number | string;
  claimed_by_id: number | null;
  claim_expires_at: Date | null;
  technician_id: number;
  technician_name: string;
  claimed_by_name: string | null;
  risk_probability: string | number | null;
};

function queueRowFrom(r: QueueSqlRow, now: Date): QueueRow {
  const claimed = r.claimed_by_id !== null && r.claim_expires_at !== null && new Date(r.claim_expires_at) > now;
  return {
    id: Number(r.id),
    claimReference: r.claim_reference,
    technician: { id: Number(r.technician_id), name: r.technician_name },
    propertyType: r.property_type,
    lossType: r.loss_type,
    cameraClass: r.camera_class,
    revision: Number(r.current_revision),
    submittedAt: isoTime(r.submitted_at),
    dueAt: isoTime(r.effective_due_at)!,
    priority: r.priority,
    status: r.status,
    claimedBy: claimed && r.claimed_by_name !== null ? { id: Number(r.claimed_by_id), name: r.claimed_by_name } : null,
    waitingOn: r.status === 'rework_requested' ? 'technician' : 'reviewer',
    pausedMs: Number(r.paused_ms),
    risk: r.risk_probability === null ? null : Number(r.risk_probability),
  };
}

export async function listQueue(actor: Actor, params: QueueParamsIn): Promise<QueuePage> {
  const built = queuePageQuery(actor, params);
  const { wholeQueue } = built;
  const page = await resolveSearch(built.page);
  const [rows, counts] = await Promise.all([pageOfJobs<QueueSqlRow>(page, QUEUE_SELECT, QUEUE_JOINS), queueStateCounts()]);
  // The unfiltered queue's size is the sum of its states' counts: no second count needed.
  const total = wholeQueue ? DEFAULT_STATUSES.reduce((sum, s) => sum + (counts[s] ?? 0), 0) : await countJobs(page);
  const now = new Date();
  return { rows: rows.map((r) => queueRowFrom(r, now)), total, page: params.page, pageSize: params.pageSize, counts };
}
