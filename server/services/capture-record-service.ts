import { Op, type Transaction } from 'sequelize';

import type { RevisionView } from '../../shared/api-types';
import { type CaptureRecord, emptyCaptureRecord } from '../../shared/capture-record';
import { resumeDueClock } from '../../shared/due-clock';
import { EDITABLE_STATUSES, JOB_STATUS_LABELS } from '../../shared/jobs';
import { checkCaptureRecord } from '../../shared/pre-submit-checks';
import { inTransaction } from '../db';
import { conflict, invalid, notFound, staleVersion } from '../errors';
import { CaptureDraft, CaptureRevision, StoredFile } from '../models';
import { recordEvent } from './audit-service';
import { assertAssignedTechnician, findJobFor } from './job-access';
import { assertReworkAnswered } from './rework-service';
import { riskOfRecord } from './risk-model-service';
import { analyseAttachedFile } from './station-service';
import { planOfJob } from './visit-plan-service';

type Actor = Express.User;

function assertEditable(status: (typeof EDITABLE_STATUSES)[number] | string) {
  if (!(EDITABLE_STATUSES as string[]).includes(status)) {
    throw conflict(
      `The capture record cannot be changed while the job is "${JOB_STATUS_LABELS[status as keyof typeof JOB_STATUS_LABELS]}".`,
    );
  }
}

async function assertPhotosBelongToJob(jobId: number, record: CaptureRecord, transaction?: Transaction) {
  const ids = [...new Set(record.damageAreas.flatMap((a) => a.photoFileIds))];
  if (ids.length === 0) return;
  const found = await StoredFile.count({ where: { jobId, id: { [Op.in]: ids }, kind: 'photo', detachedAt: null }, transaction });
  if (found !== ids.length) {
    const index = record.damageAreas.findIndex((a) => a.photoFileIds.length > 0);
    throw invalid({ [`damageAreas.${index}.photoFileIds`]: 'A photo is not attached to this job' });
  }
}

export type DraftView = { record: CaptureRecord; version: number; savedAt: string | null };

function draftView(draft: CaptureDraft | null): DraftView {
  return draft
    ? { record: draft.data, version: draft.version, savedAt: draft.updatedAt.toISOString() }
    : { record: emptyCaptureRecord(), version: 0, savedAt: null };
}

// Writes the draft as the next version, but only when it is still the version the client based
// its edits on; otherwise the client is shown both and chooses (409 with the current draft).
async function writeDraft(jobId: number, record: CaptureRecord, baseVersion: number, transaction: Transaction) {
  const draft = await CaptureDraft.findByPk(jobId, { transaction, lock: transaction.LOCK.UPDATE });
  if ((draft?.version ?? 0) !== baseVersion) throw staleVersion('This capture record', draftView(draft));
  if (!draft) return CaptureDraft.create({ jobId, data: record }, { transaction });
  draft.data = record;
  draft.version += 1;
  draft.changed('data', true);
  return draft.save({ transaction });
}

// Autosave: accepts an incomplete record (required facts are checked at submit), but never
// a malformed one (the route validates types, ranges and enums first).
export async function saveDraft(actor: Actor, jobId: number, record: CaptureRecord, baseVersion: number) {
  return inTransaction(async (transaction) => {
    const job = await findJobFor(actor, jobId, { forUpdate: true, transaction });
    assertAssignedTechnician(actor, job);
    assertEditable(job.status);
    const saved = await writeDraft(jobId, record, baseVersion, transaction);
    return { version: saved.version, savedAt: saved.updatedAt.toISOString() };
  });
}

// Freezes the record as the next immutable revision and hands the job to review.
export async function submitRecord(actor: Actor, jobId: number, record: CaptureRecord, baseVersion: number) {
  // Storage is read and the station layout analysed before any row is locked: a slow storage
  // service or a large file never holds the job's lock or a database connection.
  const preview = await findJobFor(actor, jobId);
  assertAssignedTechnician(actor, preview);
  const stationAnalysis = await analyseAttachedFile(jobId, record);
  return inTransaction(async (transaction) => {
    const job = await findJobFor(actor, jobId, { forUpdate: true, transaction });
    assertAssignedTechnician(actor, job);
    assertEditable(job.status);
    // The submitted record becomes the draft's next version too (rolled back with the rest).
    const draft = await writeDraft(jobId, record, baseVersion, transaction);

    if (job.status === 'rework_requested') await assertReworkAnswered(jobId, transaction);
    const last = await CaptureRevision.findOne({ where: { jobId }, order: [['number', 'DESC']], transaction });
    const findings = checkCaptureRecord(record, {
      previousSubmittedAt: last?.submittedAt.toISOString() ?? null,
      stationFileLevels: stationAnalysis?.levels.map((l) => ({ level: l.level, stations: l.registered })) ?? null,
      plan: await planOfJob(jobId, transaction),
    });
    if (findings.missing.length > 0) {
      throw invalid(Object.fromEntries(findings.missing.map((f) => [f.field, f.message])));
    }
    await assertPhotosBelongToJob(jobId, record, transaction);

    const files = await StoredFile.findAll({ where: { jobId, detachedAt: null }, order: [['id', 'ASC']], transaction });
    const number = (last?.number ?? 0) + 1;
    const submittedAt = new Date();
    await CaptureRevision.create(
      { jobId, number, data: record, files: files.map((f) => f.toView()), findings, stationAnalysis, submittedById: actor.id, submittedAt },
      { transaction },
    );
    job.status = number === 1 ? 'submitted' : 'resubmitted';
    job.currentRevision = number;
    job.cameraClass = record.cameraClass;
    job.submittedAt = submittedAt;
    job.riskProbability = await riskOfRecord(record, stationAnalysis, job, number, transaction);
    resumeDueClock(job, submittedAt);
    await job.save({ transaction });
    await recordEvent(transaction, jobId, actor.id, 'submitted', { revision: number, warnings: findings.warnings.length });
    return {
      revision: number,
      status: job.status,
      submittedAt: submittedAt.toISOString(),
      warnings: findings.warnings,
      recordVersion: draft.version,
    };
  });
}

export async function getRevision(actor: Actor, jobId: number, number: number): Promise<RevisionView> {
  await findJobFor(actor, jobId);
  const revision = await CaptureRevision.findOne({ where: { jobId, number } });
  if (!revision) throw notFound('Revision');
  return {
    number: revision.number,
    submittedAt: revision.submittedAt.toISOString(),
    record: revision.data,
    files: revision.files,
    findings: revision.findings,
    stationAnalysis: revision.stationAnalysis,
  };
}
