// The e-mail that goes with a review decision, queued through the outbox.
import type { Transaction } from 'sequelize';

import { reworkDueAt } from '../../shared/due-clock';
import type { Decision } from '../../shared/review';
import { config } from '../config';
import { acceptedEmail, recaptureEmail, type ReworkItemFacts, reworkRequestEmail } from '../mail/templates';
import { type Job, User } from '../models';
import { emailWanted } from './notification-service';
import { enqueueEmail } from './outbox-service';

export function jobFacts(job: Job) {
  return { claimReference: job.claimReference, street: job.street, city: job.city, jobUrl: `${config.appUrl}/jobs/${job.id}` };
}

// Queues the e-mail that goes with a decision, inside the decision's own transaction.
// Answers whether the technician's copy was queued (they may have turned it off).
export async function queueDecisionEmail(
  transaction: Transaction,
  job: Job,
  decision: Decision,
  context: {
    revision: number;
    score: number | null;
    items: ReworkItemFacts[];
    reviewerName: string;
    decidedAt: Date;
    note?: string | null;
  },
) {
  const technician = await User.findByPk(job.technicianId, { transaction });
  if (!technician) return false;
  const facts = jobFacts(job);
  // The technician's own choice in their notification settings (default: e-mailed).
  const wants = (await emailWanted(transaction, [technician.id], decision === 'rework' ? 'rework_requested' : 'decision')).has(
    technician.id,
  );
  if (decision === 'rework') {
    const email = reworkRequestEmail(
      facts,
      context.revision,
      context.items,
      reworkDueAt(context.decidedAt, config.reworkHours),
      context.reviewerName,
      context.note ?? null,
    );
    if (wants) await enqueueEmail(transaction, { ...email, jobId: job.id, kind: 'rework_request', to: [technician.email] });
  } else if (decision === 'accept') {
    if (!wants) return false;
    await enqueueEmail(transaction, {
      ...acceptedEmail(facts, context.revision, context.score, context.note ?? null),
      jobId: job.id,
      kind: 'accepted',
      to: [technician.email],
    });
  } else {
    const managers = await User.findAll({ where: { role: 'manager', active: true }, transaction });
    const to = [...(wants ? [technician.email] : []), ...managers.map((m) => m.email)];
    if (to.length === 0) return false;
    await enqueueEmail(transaction, {
      ...recaptureEmail(facts, context.revision, context.items, context.note ?? null),
      jobId: job.id,
      kind: 'recapture_required',
      to,
    });
  }
  return wants;
}
