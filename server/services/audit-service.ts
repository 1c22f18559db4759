import type { Transaction } from 'sequelize';

import { AuditEvent } from '../models';
import { notifyFromEvent } from './notification-service';

// Appends to a job's timeline inside the caller's transaction, so the event exists exactly
// when the change it describes does; the notices the event raises are written with it.
// `notify: false` for bulk moves, which tell each person once for the whole move.
export async function recordEvent(
  transaction: Transaction,
  jobId: number,
  actorId: number | null,
  type: string,
  data: object = {},
  options: { notify?: boolean } = {},
) {
  await AuditEvent.create({ jobId, actorId, type, data, createdAt: new Date() }, { transaction });
  if (options.notify !== false) await notifyFromEvent(transaction, jobId, actorId, type, data);
}
