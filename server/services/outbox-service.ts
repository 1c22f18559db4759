// The e-mail outbox: messages are written in the transaction of the change that causes them and
// sent later by any instance's worker, so nothing is lost while SMTP is down.
import type { Transporter } from 'nodemailer';
import { Op, type Transaction } from 'sequelize';

import { config } from '../config';
import { inTransaction } from '../db';
import type { Email } from '../mail/templates';
import { deliver } from '../mail/transport';
import { OutboxMessage } from '../models';
import { recordEvent } from './audit-service';

export async function enqueueEmail(
  transaction: Transaction,
  message: Email & { jobId: number | null; kind: string; to: string[]; dedupeKey?: string },
) {
  const row = await OutboxMessage.create(
    {
      jobId: message.jobId,
      kind: message.kind,
      dedupeKey: message.dedupeKey ?? null,
      recipients: message.to,
      subject: message.subject,
      textBody: message.text,
      htmlBody: message.html,
      nextAttemptAt: new Date(),
      lastError: null,
      lockedBy: null,
      lockedUntil: null,
      sentAt: null,
    },
    { transaction },
  );
  if (message.jobId)
    await recordEvent(transaction, message.jobId, null, 'email_queued', { outboxId: row.id, kind: message.kind, to: message.to });
  return row;
}

// Exponential backoff: 5 s, 10 s, 20 s, … up to the configured ceiling.
export function backoffSeconds(attempts: number) {
  return Math.min(5 * 2 ** Math.max(attempts - 1, 0), config.outbox.maxBackoffSeconds);
}

// One pass of the worker. A row is first leased to this instance with a conditional UPDATE,
// so two workers (or two instances) never send the same row.
export async function sendPendingEmails(transport: Transporter, instanceId = config.instanceId, now = new Date()) {
  const leaseUntil = new Date(now.getTime() + config.outbox.lockSeconds * 1000);
  await OutboxMessage.update(
    { lockedBy: instanceId, lockedUntil: leaseUntil },
    {
      where: {
        status: 'pending',
        nextAttemptAt: { [Op.lte]: now },
        [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: now } }],
      },
      limit: 20,
    },
  );
  const leased = await OutboxMessage.findAll({
    where: { lockedBy: instanceId, lockedUntil: leaseUntil, status: 'pending' },
    order: [['id', 'ASC']],
  });
  let sent = 0;
  for (const message of leased) {
    try {
      await deliver(transport, {
        id: message.id,
        to: message.recipients,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody,
      });
      await inTransaction(async (transaction) => {
        await message.update(
          { status: 'sent', sentAt: new Date(), attempts: message.attempts + 1, lastError: null, lockedBy: null, lockedUntil: null },
          { transaction },
        );
        if (message.jobId) await recordEvent(transaction, message.jobId, null, 'email_sent', { outboxId: message.id, kind: message.kind });
      });
      sent += 1;
    } catch (error) {
      const attempts = message.attempts + 1;
      await inTransaction(async (transaction) => {
        await message.update(
          {
            attempts,
            lastError: (error as Error).message.slice(0, 2000),
            nextAttemptAt: new Date(Date.now() + backoffSeconds(attempts) * 1000),
            lockedBy: null,
            lockedUntil: null,
          },
          { transaction },
        );
        if (message.jobId)
          await recordEvent(transaction, message.jobId, null, 'email_failed', {
            outboxId: message.id,
            kind: message.kind,
            attempt: attempts,
            error: (error as Error).message.slice(0, 200),
          });
      });
    }
  }
  return { leased: leased.length, sent };
}
