import { col, fn, Op, type WhereOptions } from 'sequelize';

import type { JobDetail } from '../../shared/api-types';
import { emptyCaptureRecord } from '../../shared/capture-record';
import { effectiveDueAt } from '../../shared/due-clock';
import { type JobInput, type JobStatus, type JobSummary, pickJobInput } from '../../shared/jobs';
import { inTransaction } from '../db';
import { HttpError, invalid } from '../errors';
import { CaptureDraft, CaptureRevision, Job, StoredFile, User } from '../models';
import { recordEvent } from './audit-service';
import { findJobFor } from './job-access';

type Actor = Express.User;

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
  };
}

export async function listJobs(actor: Actor, filters: { status?: JobStatus[]; technicianId?: number }): Promise<JobSummary[]> {
  const where: WhereOptions<Job> = {};
  if (actor.role === 'technician') where.technicianId = actor.id;
  else if (filters.technicianId) where.technicianId = filters.technicianId;
  if (filters.status?.length) where.status = { [Op.in]: filters.status };

  const jobs = await Job.findAll({
    where,
    include: [{ model: User, as: 'technician', attributes: ['id', 'name'] }],
    order: [['dueAt', 'DESC']],
    limit: 500,
  });
  const counts = await revisionCounts(jobs.map((j) => j.id));
  return jobs.map((job) => toSummary(job, counts.get(job.id) ?? 0));
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
  changes: Partial<Pick<JobInput, 'technicianId' | 'dueAt' | 'priority' | 'siteVisitDate'>>,
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

export async function getJobSummary(actor: Actor, jobId: number): Promise<JobSummary> {
  await findJobFor(actor, jobId);
  const job = await Job.findByPk(jobId, { include: [{ model: User, as: 'technician', attributes: ['id', 'name'] }] });
  const counts = await revisionCounts([jobId]);
  return toSummary(job!, counts.get(jobId) ?? 0);
}

export async function getJobDetail(actor: Actor, jobId: number): Promise<JobDetail> {
  const summary = await getJobSummary(actor, jobId);
  const [draft, revisions, files] = await Promise.all([
    CaptureDraft.findByPk(jobId),
    CaptureRevision.findAll({ where: { jobId }, attributes: ['number', 'submittedAt'], order: [['number', 'ASC']] }),
    StoredFile.findAll({ where: { jobId, detachedAt: null }, order: [['id', 'ASC']] }),
  ]);
  return {
    job: summary,
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
