import { Op, type Transaction } from 'sequelize';

import type { Dispute } from '../../shared/api-types';
import type { ReworkItemView, ReworkResponse, TimelineEvent } from '../../shared/review';
import { inTransaction } from '../db';
import { conflict, invalid, notFound } from '../errors';
import { AuditEvent, Job, Review, ReworkItem, StoredFile, User } from '../models';
import { recordEvent } from './audit-service';
import { DECISION_EMAIL_KINDS, hiddenFirstReviews } from './blind-review-service';
import { assertAssignedTechnician, findJobFor } from './job-access';

type Actor = Express.User;

export function toReworkItemView(item: ReworkItem): ReworkItemView {
  return {
    id: item.id,
    criterionKey: item.criterionKey,
    title: item.title,
    instruction: item.instruction,
    stockReason: item.stockReason,
    response: item.response,
    responseNote: item.responseNote,
    responseFileIds: item.responseFileIds ?? [],
    respondedAt: item.respondedAt ? item.respondedAt.toISOString() : null,
    disputeOutcome: item.disputeOutcome,
    disputeNote: item.disputeNote,
  };
}

// The items of the job's latest rework request.
export async function currentReworkItems(jobId: number, transaction?: Transaction) {
  const review = await Review.findOne({ where: { jobId, kind: 'primary', decision: 'rework' }, order: [['id', 'DESC']], transaction });
  if (!review) return [];
  return ReworkItem.findAll({ where: { reviewId: review.id }, order: [['id', 'ASC']], transaction });
}

export async function listReworkItems(actor: Actor, jobId: number) {
  await findJobFor(actor, jobId);
  return (await currentReworkItems(jobId)).map(toReworkItemView);
}

export async function answerReworkItem(
  actor: Actor,
  itemId: number,
  answer: { response: ReworkResponse; note: string; fileIds?: number[] },
) {
  return inTransaction(async (transaction) => {
    const item = await ReworkItem.findByPk(itemId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!item) throw notFound('Rework item');
    const job = await findJobFor(actor, item.jobId, { transaction });
    assertAssignedTechnician(actor, job);
    if (job.status !== 'rework_requested') throw conflict('This job is not waiting for rework.');
    const current = await currentReworkItems(job.id, transaction);
    if (!current.some((i) => i.id === item.id)) throw conflict('This item belongs to an earlier review.');
    if (answer.response !== 'fixed' && !answer.note.trim()) throw invalid({ note: 'Give the reason' });
    const fileIds = [...new Set(answer.fileIds ?? [])];
    if (
      fileIds.length &&
      (await StoredFile.count({ where: { id: { [Op.in]: fileIds }, jobId: job.id, detachedAt: null }, transaction })) !== fileIds.length
    ) {
      throw invalid({ fileIds: 'A file is not attached to this job' });
    }
    await item.update(
      { response: answer.response, responseNote: answer.note.trim() || null, responseFileIds: fileIds, respondedAt: new Date() },
      { transaction },
    );
    await recordEvent(transaction, job.id, actor.id, 'rework_answered', { itemId: item.id, title: item.title, response: answer.response });
    return toReworkItemView(item);
  });
}

// Resubmission needs an answer to every item of the current rework request.
export async function assertReworkAnswered(jobId: number, transaction: Transaction) {
  const open = (await currentReworkItems(jobId, transaction)).filter((i) => i.response === null);
  if (open.length)
    throw invalid({ rework: `Answer every rework item first (${open.length} open: ${open.map((i) => i.title).join(', ')}).` });
}

export async function listOpenDisputes(): Promise<Dispute[]> {
  const items = await ReworkItem.findAll({
    where: { response: 'disputed', disputeOutcome: null },
    order: [['respondedAt', 'ASC']],
    limit: 200,
  });
  const jobs = await Job.findAll({
    where: { id: { [Op.in]: items.map((i) => i.jobId) } },
    include: [{ model: User, as: 'technician', attributes: ['name'] }],
  });
  const byId = new Map(jobs.map((j) => [j.id, j]));
  return items.map((item) => ({
    ...toReworkItemView(item),
    jobId: item.jobId,
    claimReference: byId.get(item.jobId)?.claimReference ?? '',
    technician: byId.get(item.jobId)?.technician?.name ?? '',
  }));
}

export async function decideDispute(actor: Actor, itemId: number, decision: { outcome: 'upheld' | 'withdrawn'; note: string }) {
  return inTransaction(async (transaction) => {
    const item = await ReworkItem.findByPk(itemId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!item || item.response !== 'disputed') throw notFound('Disputed item');
    if (item.disputeOutcome) throw conflict('This dispute has already been decided.');
    await item.update(
      {
        disputeOutcome: decision.outcome,
        disputeNote: decision.note.trim() || null,
        disputeDecidedById: actor.id,
        disputeDecidedAt: new Date(),
      },
      { transaction },
    );
    await recordEvent(transaction, item.jobId, actor.id, 'dispute_decided', {
      itemId: item.id,
      title: item.title,
      outcome: decision.outcome,
    });
    return toReworkItemView(item);
  });
}

function withoutRecipients(data: Record<string, unknown>) {
  const { to: _to, ...rest } = data;
  return rest;
}

export async function jobTimeline(actor: Actor, jobId: number): Promise<TimelineEvent[]> {
  await findJobFor(actor, jobId);
  const events = await AuditEvent.findAll({
    where: { jobId },
    include: [{ model: User, as: 'actor', attributes: ['name'] }],
    order: [['id', 'ASC']],
  });
  // Only managers and admins see whom an e-mail went to; others see that it went.
  const showRecipients = actor.role === 'manager' || actor.role === 'admin';
  const hidden = await hiddenFirstReviews(actor, jobId);
  const reviewedRevision = new Map(
    events.filter((e) => e.type === 'reviewed').map((e) => [Number(e.id), Number((e.data as { revision?: number }).revision)]),
  );
  let blindFrom = Number.POSITIVE_INFINITY;
  return events.map((e) => {
    let data = showRecipients ? (e.data as Record<string, unknown>) : withoutRecipients(e.data as Record<string, unknown>);
    let actorName = (e.get('actor') as User | null)?.name ?? null;
    if (e.type === 'reviewed' && hidden.has(reviewedRevision.get(Number(e.id)) ?? -1)) {
      blindFrom = Number(e.id);
      data = { revision: data.revision, rubricVersion: data.rubricVersion, hidden: true };
      actorName = null;
    } else if (Number(e.id) > blindFrom && e.type.startsWith('email_') && DECISION_EMAIL_KINDS.has(String(data.kind))) {
      data = { ...data, kind: 'review_outcome' };
    }
    return { id: Number(e.id), type: e.type, data, createdAt: e.createdAt.toISOString(), actor: actorName };
  });
}
