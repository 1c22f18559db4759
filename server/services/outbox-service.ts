// The e-mail outbox: messages are written in the transaction of the change that causes them and
// sent later by any instance's worker, so nothing is lost while SMTP is down.
import type { Transporter } from 'nodemailer';
import { Op, type Transaction } from 'sequelize';

import type { FailedEmail } from '../../shared/api-types';
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

// Messages SMTP has accepted whose "sent" mark has not reached the database yet (it was down).
// Kept by this worker and applied first on every pass, so an accepted message is never sent
// again by this instance; the lease, extended before each send, keeps other instances off it.
const acknowledged = new Map<number, Date>();

async function markSent(message: OutboxMessage, sentAt: Date) {
  await inTransaction(async (transaction) => {
    await message.update(
      { status: 'sent', sentAt, attempts: message.attempts + 1, lastError: null, lockedBy: null, lockedUntil: null },
      { transaction },
    );
    if (message.jobId) await recordEvent(transaction, message.jobId, null, 'email_sent', { outboxId: message.id, kind: message.kind });
  });
}

async function applyAcknowledgements() {
  for (const [id, sentAt] of [...acknowledged]) {
    const message = await OutboxMessage.findByPk(id);
    if (message && message.status !== 'sent') await markSent(message, sentAt);
    acknowledged.delete(id);
  }
}

// One pass of the worker. A row is first leased to this instance with a conditional UPDATE,
// so two workers (or two instances) never send the same row.
export async function sendPendingEmails(transport: Transporter, instanceId = config.instanceId, now = new Date()) {
  await applyAcknowledgements();
  const leaseMs = config.outbox.lockSeconds * 1000;
  const leaseUntil = new Date(now.getTime() + leaseMs);
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
    if (acknowledged.has(message.id)) continue;
    // The lease is renewed before each send, so a slow batch never lets another worker in.
    const [renewed] = await OutboxMessage.update(
      { lockedUntil: new Date(Date.now() + leaseMs) },
      { where: { id: message.id, lockedBy: instanceId, status: 'pending' } },
    );
    if (renewed === 0) continue;
    try {
      await deliver(transport, {
        id: message.id,
        to: message.recipients,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody,
      });
    } catch (error) {
      await recordFailure(message, error as Error);
      continue;
    }
    // Accepted by SMTP: remembered before anything else can fail, then marked in the database.
    const sentAt = new Date();
    acknowledged.set(message.id, sentAt);
    try {
      await markSent(message, sentAt);
      acknowledged.delete(message.id);
    } catch {
      // The database is away; the next pass applies the mark (and sends nothing again).
    }
    sent += 1;
  }
  return { leased: leased.length, sent };
}

// A failed attempt backs off; the last allowed one marks the message failed, with one timeline
// event, and managers see it in the app (GET /api/outbox/failed).
async function recordFailure(message: OutboxMessage, error: Error) {
  const attempts = message.attempts + 1;
  const final = attempts >= config.outbox.maxAttempts;
  await inTransaction(async (transaction) => {
    await message.update(
      {
        attempts,
        status: final ? 'failed' : 'pending',
        lastError: error.message.slice(0, 2000),
        nextAttemptAt: new Date(Date.now() + backoffSeconds(attempts) * 1000),
        lockedBy: null,
        lockedUntil: null,
      },
      { transaction },
    );
    if (final && message.jobId) {
      await recordEvent(transaction, message.jobId, null, 'email_failed', {
        outboxId: message.id,
        kind: message.kind,
        attempts,
        error: error.message.slice(0, 200),
      });
    }
  });
}

export async function listFailedEmails(): Promise<FailedEmail[]> {
  const rows = await OutboxMessage.findAll({ where: { status: 'failed' }, order: [['id', 'DESC']], limit: 100 });
  return rows.map((m) => ({
    id: m.id,
    jobId: m.jobId,
    kind: m.kind,
    subject: m.subject,
    attempts: m.attempts,
    lastError: m.lastError,
    createdAt: m.createdAt.toISOString(),
  }));
}

// A manager who has fixed the cause (a wrong address, the mail service) sends it again.
export async function retryFailedEmail(id: number) {
  const [changed] = await OutboxMessage.update(
    { status: 'pending', attempts: 0, nextAttemptAt: new Date(), lockedBy: null, lockedUntil: null },
    { where: { id, status: 'failed' } },
  );
  return changed === 1;
}
