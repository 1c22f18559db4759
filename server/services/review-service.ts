import { Op, type Transaction } from 'sequelize';

import type { OpenSecondReview } from '../../shared/api-types';
import { pauseDueClock } from '../../shared/due-clock';
import type { Decision, ScoreInput, Workspace } from '../../shared/review';
import { applicability, claimExpiresAt, decisionProblem, validateScores } from '../../shared/review-rules';
import { carriesOver, diffRevisions } from '../../shared/revision-diff';
import { type Criterion, scaleMax } from '../../shared/rubric';
import { evaluate, isBelowFullMarks } from '../../shared/scoring';
import { config } from '../config';
import { inTransaction } from '../db';
import { conflict, forbidden, invalid, notFound } from '../errors';
import { CaptureRevision, Job, Review, ReviewScore, ReworkItem, Rubric, SecondReview, User } from '../models';
import { recordEvent } from './audit-service';
import { hiddenFirstReviews } from './blind-review-service';
import { assertHoldsClaim } from './claims-service';
import { queueDecisionEmail } from './decision-email-service';
import { queueDelivery } from './delivery-service';
import { toQueueRow } from './queue-service';
import { dropReviewDraft, ownReviewDraft } from './review-draft-service';
import { toReworkItemView } from './rework-service';
import { currentRubric, toRubricView } from './rubric-service';

type Actor = Express.User;

async function revisionOf(jobId: number, number: number) {
  const revision = await CaptureRevision.findOne({ where: { jobId, number } });
  if (!revision) throw notFound('Revision');
  return revision;
}

export async function getWorkspace(actor: Actor, jobId: number, secondReviewId: number | null): Promise<Workspace> {
  const job = await Job.findByPk(jobId, {
    include: [
      { model: User, as: 'technician', attributes: ['id', 'name'] },
      { model: User, as: 'claimedBy', attributes: ['id', 'name'], required: false },
    ],
  });
  if (!job || job.currentRevision === 0) throw notFound('Submitted job');
  let number = job.currentRevision;
  let secondClaim: string | null | undefined;
  let secondClaimedByMe = false;
  if (secondReviewId !== null) {
    const second = await SecondReview.findOne({ where: { id: secondReviewId, jobId } });
    if (!second) throw notFound('Second review');
    if (second.firstReviewerId === actor.id) throw forbidden('A blind second review must be made by another reviewer.');
    number = second.revisionNumber;
    secondClaimedByMe = second.claimedById === actor.id && second.claimExpiresAt !== null && second.claimExpiresAt > new Date();
    secondClaim = secondClaimedByMe ? second.claimExpiresAt!.toISOString() : null;
  }
  const [revision, rubric] = await Promise.all([revisionOf(jobId, number), currentRubric()]);
  const holdsJobClaim =
    secondReviewId === null && job.claimedById === actor.id && job.claimExpiresAt !== null && job.claimExpiresAt > new Date();
  // Working on the job counts as activity: the claimant's claim is extended.
  if (holdsJobClaim) {
    job.claimExpiresAt = claimExpiresAt(new Date(), config.review.claimMinutes);
    await job.save();
  }
  const draft = holdsJobClaim || secondClaimedByMe ? await ownReviewDraft(actor, jobId, secondReviewId, number) : null;
  return {
    job: { ...toQueueRow(job), street: job.street, city: job.city },
    revision: {
      number: revision.number,
      submittedAt: revision.submittedAt.toISOString(),
      record: revision.data,
      files: revision.files,
      findings: revision.findings,
      stationAnalysis: revision.stationAnalysis,
    },
    rubric: toRubricView(rubric),
    applicable: applicability(rubric.criteria, revision.data),
    claimExpiresAt: secondClaim !== undefined ? secondClaim : job.claimExpiresAt ? job.claimExpiresAt.toISOString() : null,
    secondReviewId,
    secondClaimedByMe,
    draft,
    // A blind second reviewer sees nothing of earlier reviews; nor does any other reviewer see
    // a first review whose blind second review is still open.
    previous: secondReviewId === null ? blindTo(await previousContext(jobId, number), await hiddenFirstReviews(actor, jobId)) : null,
  };
}

export function shouldSampleSecondReview(share: number, random: () => number = Math.random) {
  return random() < share;
}

type ReviewInput = { decision: Decision; scores: ScoreInput[]; note?: string };

// Scores, decision, job state, rework items, the timeline event and the calibration draw:
// all in one transaction, so a review is either wholly recorded or not at all.
export async function submitReview(actor: Actor, jobId: number, input: ReviewInput, random: () => number = Math.random) {
  return inTransaction(async (transaction) => {
    const job = await Job.findByPk(jobId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!job) throw notFound('Job');
    assertHoldsClaim(actor, job);
    const rubric = await currentRubric(transaction);
    const revision = await CaptureRevision.findOne({ where: { jobId, number: job.currentRevision }, transaction });
    if (!revision) throw notFound('Revision');

    const { fields, sheet } = validateScores(rubric.criteria, revision.data, input.scores);
    const evaluation = evaluate(rubric, sheet);
    const problem = Object.keys(fields).length === 0 ? decisionProblem(input.decision, evaluation) : null;
    if (problem) fields.decision = problem;
    if (Object.keys(fields).length) throw invalid(fields);

    const now = new Date();
    const review = await Review.create(
      {
        jobId,
        revisionNumber: revision.number,
        reviewerId: actor.id,
        rubricId: rubric.id,
        kind: 'primary',
        score: evaluation.score,
        passed: evaluation.passed,
        decision: input.decision,
        claimedAt: job.claimedAt,
        decidedAt: now,
        dueAt: job.effectiveDueAt,
        note: input.note?.trim() || null,
      },
      { transaction },
    );
    const carried = await carriedOverScores(jobId, revision.number, transaction);
    await saveScores(review.id, rubric.criteria, input.scores, transaction, carried);

    const failing = rubric.criteria.filter((c) => isBelowFullMarks(c, sheet[c.key]));
    const byKey = new Map(input.scores.map((s) => [s.key, s]));
    const itemFacts = failing.map((c) => ({
      title: c.title,
      instruction: byKey.get(c.key)!.comment.trim(),
      stockReason: byKey.get(c.key)!.stockReason || null,
    }));
    if (input.decision === 'rework') {
      await ReworkItem.bulkCreate(
        failing.map((c) => ({
          reviewId: review.id,
          jobId,
          criterionKey: c.key,
          title: c.title,
          instruction: byKey.get(c.key)!.comment.trim(),
          stockReason: byKey.get(c.key)!.stockReason,
          response: null,
          responseNote: null,
          respondedAt: null,
          disputeOutcome: null,
          disputeNote: null,
          disputeDecidedById: null,
          disputeDecidedAt: null,
        })),
        { transaction },
      );
      pauseDueClock(job, now);
    }
    job.status = input.decision === 'accept' ? 'accepted' : input.decision === 'rework' ? 'rework_requested' : 'recapture_required';
    job.claimedById = null;
    job.claimedAt = null;
    job.claimExpiresAt = null;
    await job.save({ transaction });
    await dropReviewDraft(transaction, jobId, null);
    await recordEvent(transaction, jobId, actor.id, 'reviewed', {
      decision: input.decision,
      score: evaluation.score,
      passed: evaluation.passed,
      rubricVersion: rubric.version,
      revision: revision.number,
      ...(input.note?.trim() ? { note: input.note.trim() } : {}),
    });
    const emailQueued = await queueDecisionEmail(transaction, job, input.decision, {
      revision: revision.number,
      score: evaluation.score,
      items: itemFacts,
      note: input.note?.trim() || null,
      reviewerName: actor.name,
      decidedAt: now,
    });
    // The adjuster's summary and link, built by the worker once this commits.
    if (input.decision === 'accept') await queueDelivery(transaction, jobId, { notify: true, requestedById: null });

    // Drawn from every first decision, so calibration sees rework and recapture calls too.
    const sampled = shouldSampleSecondReview(config.review.secondReviewShare, random);
    if (sampled) {
      await SecondReview.create(
        {
          jobId,
          revisionNumber: revision.number,
          firstReviewId: review.id,
          firstReviewerId: actor.id,
          secondReviewId: null,
          claimedById: null,
          claimExpiresAt: null,
        },
        { transaction },
      );
    }
    return {
      reviewId: review.id,
      score: evaluation.score,
      passed: evaluation.passed,
      decision: input.decision,
      failedRules: evaluation.failedRules,
      sampledForSecondReview: sampled,
      emailQueued,
    };
  });
}

async function saveScores(
  reviewId: number,
  criteria: Criterion[],
  scores: ScoreInput[],
  transaction: Transaction,
  carried: Record<string, number | null> = {},
) {
  const byKey = new Map(scores.map((s) => [s.key, s]));
  await ReviewScore.bulkCreate(
    criteria.map((c) => {
      const s = byKey.get(c.key);
      const score = s?.score ?? null;
      // Marked carried over when the reviewer kept the score offered from the last review.
      const carriedOver = c.key in carried && carried[c.key] === score;
      return {
        reviewId,
        criterionKey: c.key,
        score,
        maxScore: scaleMax(c.scale),
        stockReason: s?.stockReason || null,
        comment: s?.comment.trim() || null,
        carriedOver,
      };
    }),
    { transaction },
  );
}

// The last primary review of an earlier revision, if any: the one a resubmission answers.
async function previousReview(jobId: number, currentRevision: number, transaction?: Transaction) {
  return Review.findOne({
    where: { jobId, kind: 'primary', revisionNumber: { [Op.lt]: currentRevision } },
    order: [
      ['revisionNumber', 'DESC'],
      ['id', 'DESC'],
    ],
    transaction,
  });
}

async function changesSince(jobId: number, previousNumber: number, currentNumber: number, transaction?: Transaction) {
  const [before, after] = await Promise.all([
    CaptureRevision.findOne({ where: { jobId, number: previousNumber }, transaction }),
    CaptureRevision.findOne({ where: { jobId, number: currentNumber }, transaction }),
  ]);
  return diffRevisions({ record: before!.data, files: before!.files }, { record: after!.data, files: after!.files });
}

// Scores from the previous review for criteria whose inputs did not change.
export async function carriedOverScores(jobId: number, currentRevision: number, transaction?: Transaction) {
  const previous = await previousReview(jobId, currentRevision, transaction);
  if (!previous) return {};
  const changes = await changesSince(jobId, previous.revisionNumber, currentRevision, transaction);
  const scores = await ReviewScore.findAll({ where: { reviewId: previous.id }, transaction });
  return Object.fromEntries(scores.filter((s) => carriesOver(s.criterionKey, changes)).map((s) => [s.criterionKey, s.score]));
}

function blindTo(previous: Awaited<ReturnType<typeof previousContext>>, hidden: Set<number>) {
  if (!previous || !hidden.has(previous.revision)) return previous;
  return { ...previous, score: null, decision: null, items: [], carried: {}, hidden: true };
}

export async function previousContext(jobId: number, currentRevision: number) {
  const previous = await previousReview(jobId, currentRevision);
  if (!previous) return null;
  const changes = await changesSince(jobId, previous.revisionNumber, currentRevision);
  const [scores, items] = await Promise.all([
    ReviewScore.findAll({ where: { reviewId: previous.id } }),
    ReworkItem.findAll({ where: { reviewId: previous.id }, order: [['id', 'ASC']] }),
  ]);
  const carried = Object.fromEntries(
    scores
      .filter((s) => carriesOver(s.criterionKey, changes))
      .map((s) => [s.criterionKey, { score: s.score, stockReason: s.stockReason, comment: s.comment ?? '' }]),
  );
  return {
    revision: previous.revisionNumber,
    score: previous.score,
    decision: previous.decision,
    changes,
    items: items.map(toReworkItemView),
    carried,
  };
}

export async function listOpenSecondReviews(actor: Actor): Promise<OpenSecondReview[]> {
  const rows = await SecondReview.findAll({
    where: {
      secondReviewId: null,
      firstReviewerId: { [Op.ne]: actor.id },
      [Op.or]: [{ claimedById: null }, { claimedById: actor.id }, { claimExpiresAt: { [Op.lt]: new Date() } }],
    },
    order: [['createdAt', 'ASC']],
    limit: 50,
  });
  const jobs = await Job.findAll({ where: { id: { [Op.in]: rows.map((r) => r.jobId) } }, attributes: ['id', 'claimReference'] });
  const refOf = new Map(jobs.map((j) => [j.id, j.claimReference]));
  return rows.map((r) => ({
    id: r.id,
    jobId: r.jobId,
    claimReference: refOf.get(r.jobId) ?? '',
    revision: r.revisionNumber,
    createdAt: r.createdAt.toISOString(),
  }));
}

// Locks a blind second review to one reviewer, atomically, like a job claim.
export async function claimSecondReview(actor: Actor, secondReviewId: number) {
  const second = await SecondReview.findByPk(secondReviewId);
  if (!second) throw notFound('Second review');
  if (second.firstReviewerId === actor.id) throw forbidden('A blind second review must be made by another reviewer.');
  const now = new Date();
  const expiresAt = claimExpiresAt(now, config.review.claimMinutes);
  const [changed] = await SecondReview.update(
    { claimedById: actor.id, claimExpiresAt: expiresAt },
    {
      where: {
        id: secondReviewId,
        secondReviewId: null,
        [Op.or]: [{ claimedById: null }, { claimExpiresAt: { [Op.lt]: now } }, { claimedById: actor.id }],
      },
    },
  );
  if (changed === 0)
    throw conflict(second.secondReviewId ? 'This second review is already done.' : 'Another reviewer is scoring this second review.');
  await dropReviewDraft(undefined, second.jobId, secondReviewId, actor.id);
  return { secondReviewId, claimExpiresAt: expiresAt.toISOString() };
}

// The second reviewer scores blind: the first score is never sent, and the job's state
// does not change. The pair feeds the calibration trend.
export async function submitSecondReview(actor: Actor, secondReviewId: number, input: ReviewInput) {
  return inTransaction(async (transaction) => {
    const second = await SecondReview.findByPk(secondReviewId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!second) throw notFound('Second review');
    if (second.firstReviewerId === actor.id) throw forbidden('A blind second review must be made by another reviewer.');
    if (second.secondReviewId !== null) throw conflict('This second review is already done.');
    if (second.claimedById !== actor.id || !second.claimExpiresAt || second.claimExpiresAt < new Date()) {
      throw conflict('Claim this second review before scoring it (your claim may have expired).');
    }
    const first = await Review.findByPk(second.firstReviewId, { transaction });
    const rubric = await Rubric.findByPk(first!.rubricId, { transaction });
    const revision = await CaptureRevision.findOne({ where: { jobId: second.jobId, number: second.revisionNumber }, transaction });
    const { fields, sheet } = validateScores(rubric!.criteria, revision!.data, input.scores);
    const evaluation = evaluate(rubric!, sheet);
    const problem = Object.keys(fields).length === 0 ? decisionProblem(input.decision, evaluation) : null;
    if (problem) fields.decision = problem;
    if (Object.keys(fields).length) throw invalid(fields);
    const job = await Job.findByPk(second.jobId, { transaction });
    const review = await Review.create(
      {
        jobId: second.jobId,
        revisionNumber: second.revisionNumber,
        reviewerId: actor.id,
        rubricId: rubric!.id,
        kind: 'blind_second',
        score: evaluation.score,
        passed: evaluation.passed,
        decision: input.decision,
        claimedAt: null,
        decidedAt: new Date(),
        dueAt: job!.effectiveDueAt,
        note: input.note?.trim() || null,
      },
      { transaction },
    );
    await saveScores(review.id, rubric!.criteria, input.scores, transaction);
    second.secondReviewId = review.id;
    await second.save({ transaction });
    await dropReviewDraft(transaction, second.jobId, secondReviewId);
    await recordEvent(transaction, second.jobId, actor.id, 'blind_second_review', { revision: second.revisionNumber });
    return { reviewId: review.id, score: evaluation.score, passed: evaluation.passed };
  });
}
