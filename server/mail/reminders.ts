import { Op, UniqueConstraintError } from 'sequelize';
import { config } from '../config';
import { Job, ReworkItem, sequelize, User } from '../models';
import { enqueueEmail } from './outbox';
import { jobFacts, reworkDueAt } from './review-emails';
import { reworkReminderEmail } from './templates';

// One reminder per rework request once its answer time has passed. The dedupe key makes a
// second instance (or a second run) queue nothing.
export async function queueOverdueReworkReminders(now = new Date()) {
  const cutoff = new Date(now.getTime() - config.reworkHours * 3_600_000);
  const jobs = await Job.findAll({ where: { status: 'rework_requested', pausedAt: { [Op.lte]: cutoff } }, limit: 100 });
  let queued = 0;
  for (const job of jobs) {
    const open = await ReworkItem.count({ where: { jobId: job.id, response: null } });
    if (open === 0) continue;
    const technician = await User.findByPk(job.technicianId);
    if (!technician) continue;
    try {
      await sequelize.transaction(async (transaction) => {
        await enqueueEmail(transaction, {
          ...reworkReminderEmail(jobFacts(job), reworkDueAt(job.pausedAt!), open),
          jobId: job.id, kind: 'rework_reminder', to: [technician.email], dedupeKey: `rework-reminder:${job.id}:${job.pausedAt!.getTime()}`,
        });
      });
      queued += 1;
    } catch (error) {
      if (!(error instanceof UniqueConstraintError)) throw error;
    }
  }
  return queued;
}
