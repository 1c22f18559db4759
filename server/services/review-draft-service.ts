// A reviewer's unsaved scores, kept per claim. Only the reviewer who holds the claim can read or
// write one; it goes when the decision is recorded or the claim moves to someone else.
import { Op, type Transaction } from 'sequelize';

import type { ReviewDraft as ReviewDraftView, ReviewDraftData } from '../../shared/review';
import { inTransaction } from '../db';
import { conflict, notFound, staleVersion } from '../errors';
import { Job, ReviewDraft, SecondReview } from '../models';

type Actor = Express.User;

export const draftKeyFor = (jobId: number, secondReviewId: number | null) =>
  secondReviewId === null ? `job:${jobId}` : `second:${secondReviewId}`;

function toView(draft: ReviewDraft): ReviewDraftView {
  return { ...draft.data, version: draft.version, savedAt: draft.updatedAt.toISOString(), revision: draft.revisionNumber };
}

export async function ownReviewDraft(
  actor: Actor,
  jobId: number,
  secondReviewId: number | null,
  revision: number,
  transaction?: Transaction,
) {
  const draft = await ReviewDraft.findByPk(draftKeyFor(jobId, secondReviewId), { transaction });
  // A draft of an earlier revision, or another reviewer's, is never shown.
  return draft && draft.reviewerId === actor.id && draft.revisionNumber === revision ? toView(draft) : null;
}

// The revision the actor may score now: the job's current one under their live claim, or the
// blind second review's revision under theirs.
async function claimedRevision(actor: Actor, jobId: number, secondReviewId: number | null, transaction: Transaction) {
  const now = new Date();
  if (secondReviewId === null) {
    const job = await Job.findByPk(jobId, { transaction });
    if (!job) throw notFound('Job');
    if (job.claimedById !== actor.id || !job.claimExpiresAt || job.claimExpiresAt < now)
      throw conflict('Claim this job before scoring it.');
    return job.currentRevision;
  }
  const second = await SecondReview.findOne({ where: { id: secondReviewId, jobId }, transaction });
  if (!second) throw notFound('Second review');
  if (second.claimedById !== actor.id || !second.claimExpiresAt || second.claimExpiresAt < now || second.secondReviewId !== null) {
    throw conflict('Claim this blind review before scoring it.');
  }
  return second.revisionNumber;
}

export async function saveReviewDraft(
  actor: Actor,
  jobId: number,
  secondReviewId: number | null,
  data: ReviewDraftData,
  baseVersion: number,
) {
  return inTransaction(async (transaction) => {
    const revision = await claimedRevision(actor, jobId, secondReviewId, transaction);
    const key = draftKeyFor(jobId, secondReviewId);
    const existing = await ReviewDraft.findByPk(key, { transaction, lock: transaction.LOCK.UPDATE });
    const mine = existing && existing.reviewerId === actor.id && existing.revisionNumber === revision ? existing : null;
    if ((mine?.version ?? 0) !== baseVersion) throw staleVersion('This review draft', mine ? toView(mine) : null);
    if (existing && !mine) await existing.destroy({ transaction });
    if (mine) {
      mine.data = data;
      mine.version += 1;
      mine.changed('data', true);
      await mine.save({ transaction });
      return toView(mine);
    }
    return toView(
      await ReviewDraft.create({ draftKey: key, jobId, reviewerId: actor.id, revisionNumber: revision, data }, { transaction }),
    );
  });
}

// When a decision is recorded, or a claim is released or moved, the draft has no owner left.
export async function dropReviewDraft(
  transaction: Transaction | undefined,
  jobId: number,
  secondReviewId: number | null,
  keepFor?: number,
) {
  await ReviewDraft.destroy({
    where: { draftKey: draftKeyFor(jobId, secondReviewId), ...(keepFor !== undefined && { reviewerId: { [Op.ne]: keepFor } }) },
    transaction,
  });
}
