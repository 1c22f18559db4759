import { literal, Op, type Order, type WhereOptions } from 'sequelize';

import type { JobStatus } from '../../shared/jobs';
import type { QueueFilters, QueuePage, QueueRow, QueueSort } from '../../shared/review';
import { Job, User } from '../models';

type Actor = Express.User;

const DEFAULT_STATUSES: JobStatus[] = ['submitted', 'in_review', 'resubmitted'];
const priorityRank = (direction: 'ASC' | 'DESC') => literal(`FIELD(\`Job\`.\`priority\`, 'catastrophe', 'urgent', 'normal') ${direction}`);
const OVERDUE_FIRST = literal('(`Job`.`effective_due_at` < UTC_TIMESTAMP(3)) DESC');

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
  };
}

function orderFor(sort: QueueSort | undefined, dir: 'asc' | 'desc'): Order {
  const direction = dir.toUpperCase();
  switch (sort) {
    case 'submitted':
      return [
        ['submittedAt', direction],
        ['id', 'ASC'],
      ];
    case 'claim':
      return [['claimReference', direction]];
    case 'technician':
      return [
        [{ model: User, as: 'technician' }, 'name', direction],
        ['effectiveDueAt', 'ASC'],
      ];
    case 'priority':
      return [priorityRank(direction === 'ASC' ? 'ASC' : 'DESC'), ['effectiveDueAt', 'ASC']];
    case 'revision':
      return [
        ['currentRevision', direction],
        ['effectiveDueAt', 'ASC'],
      ];
    case 'due':
      return [
        ['effectiveDueAt', direction],
        ['id', 'ASC'],
      ];
    default:
      // Overdue first, then by due time, then the most urgent priority.
      return [OVERDUE_FIRST, ['effectiveDueAt', 'ASC'], priorityRank('ASC'), ['id', 'ASC']];
  }
}

export async function listQueue(
  actor: Actor,
  params: { page: number; pageSize: number; sort?: QueueSort; dir: 'asc' | 'desc'; filters: QueueFilters },
): Promise<QueuePage> {
  const { filters } = params;
  const statuses = filters.status?.length ? filters.status : DEFAULT_STATUSES;
  const where: WhereOptions<Job> = { status: { [Op.in]: statuses } };
  if (filters.technicianId) where.technicianId = filters.technicianId;
  if (filters.lossType) where.lossType = filters.lossType;
  if (filters.priority) where.priority = filters.priority;
  if (filters.cameraClass) where.cameraClass = filters.cameraClass;
  if (filters.submission === 'first') where.currentRevision = 1;
  if (filters.submission === 'resubmission') where.currentRevision = { [Op.gt]: 1 };
  if (filters.claimedByMe) {
    where.claimedById = actor.id;
    where.claimExpiresAt = { [Op.gt]: new Date() };
  }

  const { rows, count } = await Job.findAndCountAll({
    where,
    include: [
      { model: User, as: 'technician', attributes: ['id', 'name'] },
      { model: User, as: 'claimedBy', attributes: ['id', 'name'], required: false },
    ],
    order: orderFor(params.sort, params.dir),
    limit: params.pageSize,
    offset: (params.page - 1) * params.pageSize,
  });

  // Counts per state for the whole queue, ignoring the status filter.
  const countRows = (await Job.findAll({
    attributes: ['status', [literal('COUNT(*)'), 'n']],
    where: { status: { [Op.in]: ['submitted', 'in_review', 'resubmitted', 'rework_requested'] } },
    group: ['status'],
    raw: true,
  })) as unknown as { status: JobStatus; n: number }[];

  const now = new Date();
  return {
    rows: rows.map((job) => toQueueRow(job, now)),
    total: count,
    page: params.page,
    pageSize: params.pageSize,
    counts: Object.fromEntries(countRows.map((r) => [r.status, Number(r.n)])),
  };
}
