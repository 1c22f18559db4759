import type { Transaction } from 'sequelize';

import { forbidden, notFound } from '../errors';
import { Job } from '../models';

type Actor = Express.User;

// A technician reaches only their own jobs; another technician's job answers 404, so its
// existence is not revealed.
export async function findJobFor(actor: Actor, jobId: number, options: { forUpdate?: boolean; transaction?: Transaction } = {}) {
  const job = await Job.findByPk(jobId, {
    transaction: options.transaction,
    lock: options.forUpdate && options.transaction ? options.transaction.LOCK.UPDATE : undefined,
  });
  if (!job || (actor.role === 'technician' && job.technicianId !== actor.id)) throw notFound('Job');
  return job;
}

export function assertAssignedTechnician(actor: Actor, job: Job) {
  if (actor.role !== 'technician' || job.technicianId !== actor.id) {
    throw forbidden('Only the technician assigned to this job can change its capture record.');
  }
}
