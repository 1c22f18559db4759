// Overdue-rework reminders, queued through the outbox.
import { literal, Op, UniqueConstraintError } from 'sequelize';

import { reworkDueAt, reworkOverdueCutoff } from '../../shared/due-clock';
import { config } from '../config';
import { inTransaction } from '../db';
import { reworkReminderEmail } from '../mail/templates';
import { Job, Notification, ReworkItem, User } from '../models';
import { jobFacts } from './decision-email-service';
import { emailWanted, notify } from './notification-service';
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
        // A technician who turned reminder e-mails off still gets the notice, once.
        literal(
          "NOT EXISTS (SELECT 1 FROM notifications n WHERE n.job_id = `Job`.`id` AND n.kind = 'rework_reminder' AND n.created_at >= `Job`.`paused_at`)",
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
      const sent = await inTransaction(async (transaction) => {
        // The job row's lock makes the check-then-write safe with several instances.
        await Job.findByPk(job.id, { transaction, lock: transaction.LOCK.UPDATE });
        const told = await Notification.count({
          where: { jobId: job.id, kind: 'rework_reminder', createdAt: { [Op.gte]: job.pausedAt! } },
          transaction,
        });
        if (told > 0) return false;
        await notify(transaction, [technician], 'rework_reminder', job.id, `Rework overdue on ${job.claimReference}: ${open} item(s) open`);
        if (!(await emailWanted(transaction, [technician.id], 'rework_reminder')).has(technician.id)) return true;
        await enqueueEmail(transaction, {
          ...reworkReminderEmail(jobFacts(job), reworkDueAt(job.pausedAt!, config.reworkHours), open),
          jobId: job.id,
          kind: 'rework_reminder',
          to: [technician.email],
          dedupeKey: `rework-reminder:${job.id}:${job.pausedAt!.getTime()}`,
        });
        return true;
      });
      if (sent) queued += 1;
    } catch (error) {
      if (!(error instanceof UniqueConstraintError)) throw error;
    }
  }
  return queued;
}
