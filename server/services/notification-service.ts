// Raises, lists and marks in-app notifications. They are written in the transaction of the
// event that raises them, so a notice exists exactly when its event does; the optional e-mail
// goes through the outbox in the same transaction.
import { Op, type Transaction } from 'sequelize';

import {
  type Audience,
  EMAIL_BY_DEFAULT,
  kindsFor,
  noticeForEvent,
  NOTIFICATION_LABELS,
  type NotificationKind,
  type NotificationList,
  type NotificationPref as PrefView,
  OWN_EMAIL,
} from '../../shared/notifications';
import { config } from '../config';
import { notFound } from '../errors';
import { notificationEmail } from '../mail/templates';
import { Job, Notification, NotificationPref, User } from '../models';
import { enqueueEmail } from './outbox-service';

type Actor = Express.User;
const LIST_SIZE = 50;

async function recipients(transaction: Transaction, audience: Audience, job: Job, actorId: number | null): Promise<User[]> {
  const where =
    'technician' in audience ? { id: job.technicianId } : 'userId' in audience ? { id: audience.userId } : { role: audience.role };
  const users = await User.findAll({ where: { ...where, active: true }, transaction });
  // Nobody is told about what they did themselves.
  return users.filter((u) => u.id !== actorId);
}

// Whether each of these people wants e-mail for this kind (their choice, else the default).
export async function emailWanted(transaction: Transaction | undefined, userIds: number[], kind: NotificationKind) {
  if (userIds.length === 0) return new Set<number>();
  const prefs = await NotificationPref.findAll({ where: { userId: { [Op.in]: userIds }, kind }, transaction });
  const chosen = new Map(prefs.map((p) => [p.userId, Boolean(p.email)]));
  return new Set(userIds.filter((id) => chosen.get(id) ?? EMAIL_BY_DEFAULT[kind]));
}

export async function notify(transaction: Transaction, users: User[], kind: NotificationKind, jobId: number | null, text: string) {
  if (users.length === 0) return;
  const now = new Date();
  await Notification.bulkCreate(
    users.map((u) => ({ userId: u.id, jobId, kind, text, createdAt: now, readAt: null })),
    { transaction },
  );
  if (OWN_EMAIL.has(kind)) return;
  const wanted = await emailWanted(
    transaction,
    users.map((u) => u.id),
    kind,
  );
  for (const user of users.filter((u) => wanted.has(u.id))) {
    const link = jobId === null ? config.appUrl : `${config.appUrl}${user.role === 'reviewer' ? '/queue' : '/jobs'}/${jobId}`;
    await enqueueEmail(transaction, { ...notificationEmail(text, link), jobId, kind: `notice_${kind}`, to: [user.email] });
  }
}

// Called for every timeline event: raises the notice that event means, if any.
export async function notifyFromEvent(transaction: Transaction, jobId: number, actorId: number | null, type: string, data: object) {
  // Most events raise nothing: ask before reading the job.
  if (!noticeForEvent(type, data as Record<string, unknown>, '')) return;
  const job = await Job.findByPk(jobId, { transaction, attributes: ['id', 'technicianId', 'claimReference'] });
  if (!job) return;
  const notice = noticeForEvent(type, data as Record<string, unknown>, job.claimReference);
  if (!notice) return;
  await notify(transaction, await recipients(transaction, notice.audience, job, actorId), notice.kind, jobId, notice.text);
}

export async function listNotifications(actor: Actor): Promise<NotificationList> {
  const [rows, unread] = await Promise.all([
    Notification.findAll({ where: { userId: actor.id }, order: [['id', 'DESC']], limit: LIST_SIZE }),
    Notification.count({ where: { userId: actor.id, readAt: null } }),
  ]);
  return {
    unread,
    items: rows.map((n) => ({
      id: n.id,
      kind: n.kind,
      text: n.text,
      jobId: n.jobId,
      createdAt: n.createdAt.toISOString(),
      read: n.readAt !== null,
    })),
  };
}

export async function markRead(actor: Actor, id: number) {
  const [changed] = await Notification.update({ readAt: new Date() }, { where: { id, userId: actor.id, readAt: null } });
  if (changed === 0 && !(await Notification.findOne({ where: { id, userId: actor.id } }))) throw notFound('Notification');
}

export async function markAllRead(actor: Actor) {
  await Notification.update({ readAt: new Date() }, { where: { userId: actor.id, readAt: null } });
}

export async function listPrefs(actor: Actor): Promise<PrefView[]> {
  const kinds = kindsFor(actor.role);
  const prefs = await NotificationPref.findAll({ where: { userId: actor.id } });
  const chosen = new Map(prefs.map((p) => [p.kind, Boolean(p.email)]));
  return kinds.map((kind) => ({ kind, label: NOTIFICATION_LABELS[kind], email: chosen.get(kind) ?? EMAIL_BY_DEFAULT[kind] }));
}

export async function setPref(actor: Actor, kind: NotificationKind, email: boolean) {
  await NotificationPref.upsert({ userId: actor.id, kind, email, updatedAt: new Date() });
  return listPrefs(actor);
}
