// The e-mail that goes with a review decision, queued through the outbox.
import type { Transaction } from 'sequelize';

import { reworkDueAt } from '../../shared/due-clock';
import type { Decision } from '../../shared/review';
import { config } from '../config';
import { acceptedEmail, recaptureEmail, type ReworkItemFacts, reworkRequestEmail } from '../mail/templates';
import { type Job, User } from '../models';
import { enqueueEmail } from './outbox-service';

export function jobFacts(job: Job) {
  return { claimReference: job.claimReference, street: job.street, city: job.city, jobUrl: `${config.appUrl}/jobs/${job.id}` };
}

// Queues the e-mail that goes with a decision, inside the decision's own transaction.
export async function queueDecisionEmail(
  transaction: Transaction,
  job: Job,
  decision: Decision,
  context: { revision: number; score: number | null; items: ReworkItemFacts[]; reviewerName: string; decidedAt: Date },
) {
  const technician = await User.findByPk(job.technicianId, { transaction });
  if (!technician) return;
  const facts = jobFacts(job);
  if (decision === 'rework') {
    const email = reworkRequestEmail(
      facts,
      context.revision,
      context.items,
      reworkDueAt(context.decidedAt, config.reworkHours),
      context.reviewerName,
    );
    await enqueueEmail(transaction, { ...email, jobId: job.id, kind: 'rework_request', to: [technician.email] });
  } else if (decision === 'accept') {
    await enqueueEmail(transaction, {
      ...acceptedEmail(facts, context.revision, context.score),
      jobId: job.id,
      kind: 'accepted',
      to: [technician.email],
    });
  } else {
    const managers = await User.findAll({ where: { role: 'manager', active: true }, transaction });
    const to = [technician.email, ...managers.map((m) => m.email)];
    await enqueueEmail(transaction, {
      ...recaptureEmail(facts, context.revision, context.items),
      jobId: job.id,
      kind: 'recapture_required',
      to,
    });
  }
}
