import { col, fn, Op } from 'sequelize';

import type { JobDetail } from '../../shared/api-types';
import { emptyCaptureRecord } from '../../shared/capture-record';
import { type ClaimContacts, CONTACT_FIELDS } from '../../shared/contacts';
import { effectiveDueAt, reworkDueAt } from '../../shared/due-clock';
import {
  JOB_SORT_DEFAULT_DIR,
  type JobInput,
  type JobListQuery,
  type JobPage,
  type JobSort,
  type JobSummary,
  pickJobInput,
} from '../../shared/jobs';
import { bulkMoveText } from '../../shared/notifications';
import { config } from '../config';
import { inTransaction } from '../db';
import { HttpError, invalid } from '../errors';
import { CaptureDraft, CaptureRevision, Job, StoredFile, User } from '../models';
import { recordEvent } from './audit-service';
import { findJobFor } from './job-access';
import { countJobs, isoTime, type JobPageQuery, pageOfJobs, resolveSearch, stateCounts } from './job-page-query';
import { notify } from './notification-service';

type Actor = Express.User;

function reworkDueFor(status: JobSummary['status'], pausedAt: Date | string | null) {
  return status === 'rework_requested' && pausedAt ? reworkDueAt(new Date(pausedAt), config.reworkHours).toISOString() : null;
}

function toSummary(job: Job, revisionCount: number): JobSummary {
  return {
    id: job.id,
    claimReference: job.claimReference,
    street: job.street,
    city: job.city,
    postcode: job.postcode,
    propertyType: job.propertyType,
    lossType: job.lossType,
    lossDate: job.lossDate,
    siteVisitDate: job.siteVisitDate,
    dueAt: job.dueAt.toISOString(),
    priority: job.priority,
    status: job.status,
    technician: { id: job.technician!.id, name: job.technician!.name },
    revisionCount,
    reworkDueAt: reworkDueFor(job.status, job.pausedAt),
  };
}

const JOB_COUNT_CAP = 10_000;

// Each sort's columns, and the index that serves it over every job.
const JOB_ORDERS: Record<JobSort, { columns: string[]; index: string }> = {
  due: { columns: ['due_at', 'id'], index: 'jobs_list_due' },
  claim: { columns: ['claim_reference'], index: 'claim_reference' },
  technician: { columns: ['technician_name', 'due_at', 'id'], index: 'jobs_list_technician_name' },
  visit: { columns: ['site_visit_date', 'id'], index: 'jobs_list_visit' },
};

function jobIndexFor(sort: JobSort, query: JobListQuery, technicianId: number | undefined) {
  if (query.q) return undefined;
  const statuses = query.status?.length ?? 0;
  if (!technicianId && !statuses) return JOB_ORDERS[sort].index;
  if (sort !== 'due' || statuses > 1) return undefined;
  if (technicianId) return statuses ? 'jobs_technician_id_status_due_at' : 'jobs_list_by_technician';
  return 'jobs_status_due_at';
}

// One page of jobs, in SQL: a technician sees only their own.
export function jobListPageQuery(actor: Actor, query: JobListQuery): JobPageQuery {
  const conditions: string[] = [];
  const params: Record<string, unknown> = {};
  const technicianId = actor.role === 'technician' ? actor.id : query.technicianId;
  if (technicianId) {
    conditions.push('j.technician_id = :technicianId');
    params.technicianId = technicianId;
  }
  if (query.status?.length) {
    conditions.push('j.status IN (:statuses)');
    params.statuses = query.status;
  }
  const sort = query.sort ?? 'due';
  const direction = (query.dir ?? JOB_SORT_DEFAULT_DIR[sort]) === 'desc' ? 'DESC' : 'ASC';
  const page = query.page ?? 1;
  const pageSize = query.pageSize ?? 50;
  return {
    conditions,
    params,
    search: query.q,
    orderBy: JOB_ORDERS[sort].columns.map((c) => `j.${c} ${direction}`),
    limit: pageSize,
    offset: (page - 1) * pageSize,
    index: jobIndexFor(sort, query, technicianId),
  };
}

export const JOB_SELECT = `j.id, j.claim_reference, j.street, j.city, j.postcode, j.property_type, j.loss_type,
  DATE_FORMAT(j.loss_date, '%Y-%m-%d') AS loss_date, DATE_FORMAT(j.site_visit_date, '%Y-%m-%d') AS site_visit_date,
  j.due_at, j.paused_at, j.priority, j.status, t.id AS technician_id, t.name AS technician_name,
  (SELECT COUNT(*) FROM capture_revisions r WHERE r.job_id = j.id) AS revision_count`;
export const JOB_JOINS = 'JOIN users t ON t.id = j.technician_id';
type JobSqlRow = {
  id: number;
  claim_reference: string;
  street: string;
  city: string;
  postcode: string;
  property_type: JobSummary['propertyType'];
  loss_type: JobSummary['lossType'];
  loss_date: string;
  site_visit_date: string | null;
  due_at: Date;
  paused_at: Date | null;
  priority: JobSummary['priority'];
  status: JobSummary['status'];
  technician_id: number;
  technician_name: string;
  revision_count: number | string;
};

const summaryFrom = (r: JobSqlRow): JobSummary => ({
  id: Number(r.id),
  claimReference: r.claim_reference,
  street: r.street,
  city: r.city,
  postcode: r.postcode,
  propertyType: r.property_type,
  lossType: r.loss_type,
  lossDate: r.loss_date,
  siteVisitDate: r.site_visit_date,
  dueAt: isoTime(r.due_at)!,
  priority: r.priority,
  status: r.status,
  technician: { id: Number(r.technician_id), name: r.technician_name },
  revisionCount: Number(r.revision_count),
  reworkDueAt: reworkDueFor(r.status, r.paused_at),
});

export async function listJobs(actor: Actor, query: JobListQuery): Promise<JobPage> {
  const pageQuery = await resolveSearch(jobListPageQuery(actor, query));
  // Without a technician or a search the total is the kept count of the states shown (exact);
  // otherwise it is counted from the index, up to a cap.
  const byState = actor.role !== 'technician' && !query.technicianId && !query.q;
  const [rows, counted] = await Promise.all([
    pageOfJobs<JobSqlRow>(pageQuery, JOB_SELECT, JOB_JOINS),
    byState
      ? stateCounts(query.status?.length ? query.status : undefined).then((c) => Object.values(c).reduce((s, n) => s + (n ?? 0), 0))
      : countJobs(pageQuery, JOB_COUNT_CAP + 1),
  ]);
  const capped = !byState && counted > JOB_COUNT_CAP;
  const total = capped ? JOB_COUNT_CAP : counted;
  return { jobs: rows.map(summaryFrom), total, totalIsAtLeast: capped, page: query.page ?? 1, pageSize: pageQuery.limit };
}

async function revisionCounts(jobIds: number[]) {
  if (jobIds.length === 0) return new Map<number, number>();
  const rows = (await CaptureRevision.findAll({
    attributes: ['jobId', [fn('COUNT', col('id')), 'n']],
    where: { jobId: { [Op.in]: jobIds } },
    group: ['jobId'],
    raw: true,
  })) as unknown as { jobId: number; n: number }[];
  return new Map(rows.map((r) => [r.jobId, Number(r.n)]));
}

async function assertActiveTechnician(technicianId: number) {
  const technician = await User.findByPk(technicianId);
  if (!technician || technician.role !== 'technician' || !technician.active) {
    throw invalid({ technicianId: 'Choose an active technician' });
  }
}

export async function createJob(actor: Actor, input: JobInput): Promise<JobSummary> {
  await assertActiveTechnician(input.technicianId);
  if (await Job.findOne({ where: { claimReference: input.claimReference } })) {
    throw new HttpError(409, 'conflict', 'A job with that claim reference already exists.', { claimReference: 'Already in use' });
  }
  const job = await inTransaction(async (transaction) => {
    const dueAt = new Date(input.dueAt);
    const created = await Job.create(
      {
        ...pickJobInput(input),
        dueAt,
        effectiveDueAt: dueAt,
        createdById: actor.id,
        cameraClass: null,
        submittedAt: null,
        pausedAt: null,
        claimedById: null,
        claimedAt: null,
        claimExpiresAt: null,
      },
      { transaction },
    );
    await recordEvent(transaction, created.id, actor.id, 'created', { claimReference: created.claimReference });
    await recordEvent(transaction, created.id, actor.id, 'assigned', { technicianId: input.technicianId });
    await CaptureDraft.create({ jobId: created.id, data: emptyCaptureRecord() }, { transaction });
    return created;
  });
  return getJobSummary(actor, job.id);
}

export async function updateJob(
  actor: Actor,
  jobId: number,
  changes: Partial<Pick<JobInput, 'technicianId' | 'dueAt' | 'priority' | 'siteVisitDate' | keyof ClaimContacts>>,
) {
  if (changes.technicianId !== undefined) await assertActiveTechnician(changes.technicianId);
  await inTransaction(async (transaction) => {
    const job = await findJobFor(actor, jobId, { forUpdate: true, transaction });
    const { dueAt, ...rest } = changes;
    const previousTechnician = job.technicianId;
    // Only the fields sent change: an absent field is undefined, never a null to write.
    for (const [field, value] of Object.entries(rest)) if (value !== undefined) job.set(field as keyof typeof rest, value as never);
    if (dueAt !== undefined) {
      job.dueAt = new Date(dueAt);
      job.effectiveDueAt = effectiveDueAt(job.dueAt, job.pausedMs);
    }
    await job.save({ transaction });
    if (changes.technicianId !== undefined && changes.technicianId !== previousTechnician) {
      await recordEvent(transaction, job.id, actor.id, 'reassigned', { from: previousTechnician, to: changes.technicianId });
    }
  });
  return getJobSummary(actor, jobId);
}

// Several jobs to one technician in one transaction: all move or none do. One timeline event
// per job, one notice for the technician. Accepted jobs are delivered and stay where they are.
export async function reassignJobs(actor: Actor, input: { jobIds: number[]; technicianId: number }) {
  await assertActiveTechnician(input.technicianId);
  const ids = [...new Set(input.jobIds)];
  return inTransaction(async (transaction) => {
    const jobs = await Job.findAll({ where: { id: { [Op.in]: ids } }, order: [['id', 'ASC']], transaction, lock: transaction.LOCK.UPDATE });
    const missing = ids.filter((id) => !jobs.some((j) => j.id === id));
    if (missing.length) throw invalid({ jobIds: `No such job: ${missing.join(', ')}. Nothing was moved.` });
    const delivered = jobs.filter((j) => j.status === 'accepted');
    if (delivered.length)
      throw invalid({ jobIds: `Accepted jobs cannot move: ${delivered.map((j) => j.claimReference).join(', ')}. Nothing was moved.` });
    const moving = jobs.filter((j) => j.technicianId !== input.technicianId);
    for (const job of moving) {
      const from = job.technicianId;
      job.technicianId = input.technicianId;
      await job.save({ transaction });
      await recordEvent(transaction, job.id, actor.id, 'reassigned', { from, to: input.technicianId }, { notify: false });
    }
    if (moving.length) {
      const technician = await User.findByPk(input.technicianId, { transaction });
      await notify(
        transaction,
        [technician!],
        'job_assigned',
        moving.length === 1 ? moving[0].id : null,
        bulkMoveText(
          'job_assigned',
          moving.map((j) => j.claimReference),
        ),
      );
    }
    return { moved: moving.length };
  });
}

export async function getJobSummary(actor: Actor, jobId: number): Promise<JobSummary> {
  await findJobFor(actor, jobId);
  const job = await Job.findByPk(jobId, { include: [{ model: User, as: 'technician', attributes: ['id', 'name'] }] });
  const counts = await revisionCounts([jobId]);
  return toSummary(job!, counts.get(jobId) ?? 0);
}

export async function getJobDetail(actor: Actor, jobId: number): Promise<JobDetail> {
  const summary = await getJobSummary(actor, jobId);
  const [row, draft, revisions, files] = await Promise.all([
    Job.findByPk(jobId, { attributes: [...CONTACT_FIELDS] }),
    CaptureDraft.findByPk(jobId),
    CaptureRevision.findAll({ where: { jobId }, attributes: ['number', 'submittedAt'], order: [['number', 'ASC']] }),
    StoredFile.findAll({ where: { jobId, detachedAt: null }, order: [['id', 'ASC']] }),
  ]);
  return {
    job: summary,
    contacts: Object.fromEntries(CONTACT_FIELDS.map((f) => [f, row?.[f] ?? null])) as ClaimContacts,
    record: draft?.data ?? emptyCaptureRecord(),
    recordVersion: draft?.version ?? 0,
    recordSavedAt: draft ? draft.updatedAt.toISOString() : null,
    revisions: revisions.map((r) => ({ number: r.number, submittedAt: r.submittedAt.toISOString() })),
    files: files.map((f) => f.toView()),
  };
}

export async function listTechnicians() {
  const technicians = await User.findAll({
    where: { role: 'technician', active: true },
    attributes: ['id', 'name'],
    order: [['name', 'ASC']],
  });
  return technicians.map((t) => ({ id: t.id, name: t.name }));
}
