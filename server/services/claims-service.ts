import { Op, type Transaction } from 'sequelize';

import { bulkMoveText } from '../../shared/notifications';
import { claimExpiresAt } from '../../shared/review-rules';
import { config } from '../config';
import { inTransaction } from '../db';
import { conflict, HttpError, invalid, notFound } from '../errors';
import { Job, User } from '../models';
import { recordEvent } from './audit-service';
import { pageOfJobs, resolveSearch } from './job-page-query';
import { notify } from './notification-service';
import { activeClaim, queuePageQuery, type QueueParamsIn } from './queue-service';
import { dropReviewDraft } from './review-draft-service';

type Actor = Express.User;

const CLAIMABLE: Job['status'][] = ['submitted', 'resubmitted', 'in_review'];

// One conditional UPDATE decides the race: it only matches while nobody else holds a live
// claim, so of any number of simultaneous claims exactly one changes the row.
export async function claimJob(actor: Actor, jobId: number) {
  return inTransaction(async (transaction) => {
    const now = new Date();
    const [changed] = await Job.update(
      { claimedById: actor.id, claimedAt: now, claimExpiresAt: claimExpiresAt(now, config.review.claimMinutes), status: 'in_review' },
      {
        where: {
          id: jobId,
          status: { [Op.in]: CLAIMABLE },
          [Op.or]: [{ claimedById: null }, { claimExpiresAt: { [Op.lt]: now } }, { claimedById: actor.id }],
        },
        transaction,
      },
    );
    const job = await Job.findByPk(jobId, { include: [{ model: User, as: 'claimedBy', attributes: ['id', 'name'] }], transaction });
    if (!job) throw notFound('Job');
    if (changed === 0) {
      if (!CLAIMABLE.includes(job.status)) throw conflict('This job is not waiting for review.');
      const holder = job.get('claimedBy') as User | null;
      throw new HttpError(409, 'already_claimed', `${holder?.name ?? 'Another reviewer'} has claimed this job.`);
    }
    await dropReviewDraft(transaction, jobId, null, actor.id);
    await recordEvent(transaction, jobId, actor.id, 'claimed', { until: job.claimExpiresAt!.toISOString() });
    return { jobId, claimedBy: { id: actor.id, name: actor.name }, claimExpiresAt: job.claimExpiresAt!.toISOString() };
  });
}

// The next record in the reviewer's current queue filter and sort that nobody else holds,
// claimed. Candidates are tried in queue order: a claim lost to a faster colleague moves on
// to the following one, so two reviewers pressing "Claim next" at once get different records.
export async function claimNext(actor: Actor, params: Omit<QueueParamsIn, 'page' | 'pageSize'>) {
  const { page } = queuePageQuery(actor, { ...params, page: 1, pageSize: 20 });
  page.conditions.push(
    "j.status IN ('submitted', 'resubmitted', 'in_review')",
    '(j.claimed_by_id IS NULL OR j.claim_expires_at < UTC_TIMESTAMP(3) OR j.claimed_by_id = :nextFor)',
  );
  page.params.nextFor = actor.id;
  const candidates = await pageOfJobs<{ id: number }>(await resolveSearch(page), 'j.id', '');
  for (const { id } of candidates) {
    try {
      return await claimJob(actor, Number(id));
    } catch (error) {
      if (!(error instanceof HttpError) || error.status !== 409) throw error;
    }
  }
  return null;
}

export async function releaseClaim(actor: Actor, jobId: number) {
  return inTransaction(async (transaction) => {
    const job = await Job.findByPk(jobId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!job) throw notFound('Job');
    if (!activeClaim(job) || (job.claimedById !== actor.id && actor.role !== 'manager')) {
      throw conflict('You do not hold a claim on this job.');
    }
    await releaseRow(job, transaction);
    await recordEvent(transaction, jobId, actor.id, 'released', {});
  });
}

async function releaseRow(job: Job, transaction: Transaction) {
  job.claimedById = null;
  job.claimedAt = null;
  job.claimExpiresAt = null;
  if (job.status === 'in_review') job.status = job.currentRevision > 1 ? 'resubmitted' : 'submitted';
  await job.save({ transaction });
}

// Managers move claims to another reviewer: named jobs, or every live claim of one reviewer.
export async function reassignClaims(actor: Actor, input: { toReviewerId: number; jobIds?: number[]; fromReviewerId?: number }) {
  const target = await User.findByPk(input.toReviewerId);
  if (!target || target.role !== 'reviewer' || !target.active) throw invalid({ toReviewerId: 'Choose an active reviewer' });
  return inTransaction(async (transaction) => {
    const now = new Date();
    const where = input.jobIds?.length
      ? { id: { [Op.in]: input.jobIds } }
      : { claimedById: input.fromReviewerId!, claimExpiresAt: { [Op.gt]: now } };
    const jobs = await Job.findAll({ where, transaction, lock: transaction.LOCK.UPDATE });
    for (const job of jobs) {
      if (!CLAIMABLE.includes(job.status)) continue;
      const from = job.claimedById;
      await job.update(
        { claimedById: target.id, claimedAt: now, claimExpiresAt: claimExpiresAt(now, config.review.claimMinutes), status: 'in_review' },
        { transaction },
      );
      await dropReviewDraft(transaction, job.id, null, target.id);
      await recordEvent(transaction, job.id, actor.id, 'claim_reassigned', { from, to: target.id }, { notify: false });
    }
    const moved = jobs.filter((j) => j.claimedById === target.id);
    // One notice for the whole move, not one per claim.
    if (moved.length)
      await notify(
        transaction,
        [target],
        'claim_moved',
        moved.length === 1 ? moved[0].id : null,
        bulkMoveText(
          'claim_moved',
          moved.map((j) => j.claimReference),
        ),
      );
    return { moved: moved.length };
  });
}

export function assertHoldsClaim(actor: Actor, job: Job) {
  if (!activeClaim(job) || job.claimedById !== actor.id) {
    throw conflict('Claim this job before scoring it (your claim may have expired).');
  }
}
