// Overdue-rework reminders, queued through the outbox.
import { literal, Op, UniqueConstraintError } from 'sequelize';

import { reworkDueAt, reworkOverdueCutoff } from '../../shared/due-clock';
import { config } from '../config';
import { inTransaction } from '../db';
import { reworkReminderEmail } from '../mail/templates';
import { Job, ReworkItem, User } from '../models';
import { jobFacts } from './decision-email-service';
import { enqueueEmail } from './outbox-service';

// One reminder per rework request once its answer time has passed. The dedupe key makes a
// second instance (or a second run) queue nothing.
export async function queueOverdueReworkReminders(now = new Date()) {
  const cutoff = reworkOverdueCutoff(now, config.reworkHours);
  // Jobs already reminded for this rework request are left out in SQL, so a worker tick does
  // no per-job work once the reminders are out.
  const jobs = await Job.findAll({
    where: {
      status: 'rework_requested',
      pausedAt: { [Op.lte]: cutoff },
      [Op.and]: [
        literal(
          "NOT EXISTS (SELECT 1 FROM outbox o WHERE o.job_id = `Job`.`id` AND o.kind = 'rework_reminder' AND o.created_at >= `Job`.`paused_at`)",
        ),
      ],
    },
    limit: 100,
  });
  let queued = 0;
  for (const job of jobs) {
    const open = await ReworkItem.count({ where: { jobId: job.id, response: null } });
    if (open === 0) continue;
    const technician = await User.findByPk(job.technicianId);
    if (!technician) continue;
    try {
      await inTransaction(async (transaction) => {
        await enqueueEmail(transaction, {
          ...reworkReminderEmail(jobFacts(job), reworkDueAt(job.pausedAt!, config.reworkHours), open),
          jobId: job.id,
          kind: 'rework_reminder',
          to: [technician.email],
          dedupeKey: `rework-reminder:${job.id}:${job.pausedAt!.getTime()}`,
        });
      });
      queued += 1;
    } catch (error) {
      if (!(error instanceof UniqueConstraintError)) throw error;
    }
  }
  return queued;
}
