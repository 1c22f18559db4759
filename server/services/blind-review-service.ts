// While a blind second review of a revision is open, the first review of that revision (its
// score, decision and author) is hidden from every reviewer but its author: any of them may
// be the one who scores it blind.
import { Op } from 'sequelize';

import { SecondReview } from '../models';

type Actor = Express.User;

export async function hiddenFirstReviews(actor: Actor, jobId: number): Promise<Set<number>> {
  if (actor.role !== 'reviewer') return new Set();
  const open = await SecondReview.findAll({
    where: { jobId, secondReviewId: null, firstReviewerId: { [Op.ne]: actor.id } },
    attributes: ['revisionNumber'],
  });
  return new Set(open.map((s) => s.revisionNumber));
}

// E-mail kinds that name a decision.
export const DECISION_EMAIL_KINDS = new Set(['accepted', 'rework_request', 'recapture_required']);
