// Account lifecycle by e-mail: invitations, forgotten passwords and password changes. Links are
// random (256 bits), single-use and expiring; only their SHA-256 is stored; every message goes
// through the outbox.
import crypto from 'node:crypto';

import bcrypt from 'bcryptjs';
import { Op, QueryTypes, type Transaction } from 'sequelize';

import type { UserRow } from '../../shared/api-types';
import type { Role } from '../../shared/roles';
import { passwordProblem } from '../auth/password-policy';
import { config } from '../config';
import { inTransaction, sequelize } from '../db';
import { HttpError, invalid } from '../errors';
import { invitationEmail, passwordResetEmail } from '../mail/templates';
import { accountKey } from '../middleware/sign-in-limits';
import { PasswordToken, Session, User } from '../models';
import { enqueueEmail } from './outbox-service';
import { hashPassword, normaliseEmail } from './users-service';

const INVITE_HOURS = 7 * 24;
const RESET_HOURS = 1;

const hashToken = (token: string) => crypto.createHash('sha256').update(token).digest('hex');

async function issueLink(transaction: Transaction, user: User, purpose: 'invite' | 'reset') {
  const token = crypto.randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + (purpose === 'invite' ? INVITE_HOURS : RESET_HOURS) * 3_600_000);
  // A new link replaces any earlier unused one of the same purpose.
  await PasswordToken.destroy({ where: { userId: user.id, purpose, usedAt: null }, transaction });
  await PasswordToken.create({ userId: user.id, tokenHash: hashToken(token), purpose, expiresAt, usedAt: null }, { transaction });
  const link = `${config.appUrl}/set-password?token=${token}`;
  const email = purpose === 'invite' ? invitationEmail(user.name, link, expiresAt) : passwordResetEmail(user.name, link, expiresAt);
  await enqueueEmail(transaction, {
    ...email,
    jobId: null,
    kind: purpose === 'invite' ? 'invitation' : 'password_reset',
    to: [user.email],
  });
}

// An admin makes an account; its owner chooses the password through the invitation.
export async function inviteUser(input: { name: string; email: string; role: Role }): Promise<UserRow> {
  const email = normaliseEmail(input.email);
  return inTransaction(async (transaction) => {
    if (await User.findOne({ where: { email }, transaction })) {
      throw new HttpError(409, 'conflict', 'An account with that e-mail already exists.', { email: 'Already in use' });
    }
    const user = await User.create({ name: input.name.trim(), email, role: input.role, passwordHash: null }, { transaction });
    await issueLink(transaction, user, 'invite');
    return user.toRow();
  });
}

// Always the same answer and about the same time, whether or not the address has an account.
export async function requestPasswordReset(email: string) {
  const user = await User.findOne({ where: { email: normaliseEmail(email), active: true } });
  if (!user) return;
  await inTransaction((transaction) => issueLink(transaction, user, 'reset'));
}

// Sets the password from a link: the link is spent, every session of the account ends, and any
// sign-in slow-down on the account is lifted (the owner has proved the mailbox is theirs).
export async function setPasswordWithToken(token: string, password: string) {
  const problem = passwordProblem(password);
  if (problem) throw invalid({ password: problem });
  const hash = await hashPassword(password);
  return inTransaction(async (transaction) => {
    const row = await PasswordToken.findOne({
      where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new HttpError(410, 'link_expired', 'This link has expired or was already used. Ask for a new one.');
    const user = await User.findByPk(row.userId, { transaction });
    if (!user || !user.active) throw new HttpError(410, 'link_expired', 'This link has expired or was already used. Ask for a new one.');
    user.passwordHash = hash;
    await user.save({ transaction });
    row.usedAt = new Date();
    await row.save({ transaction });
    await Session.destroy({ where: { userId: user.id }, transaction });
    await sequelize.query('DELETE FROM rate_limit_hits WHERE `key` = ?', {
      replacements: [`signin-account:${accountKey(user.email)}`],
      type: QueryTypes.DELETE,
      transaction,
    });
    return { email: user.email };
  });
}

// A signed-in person changes their password; their other sessions end, this one stays.
export async function changePassword(userId: number, currentSessionId: string, current: string, next: string) {
  const user = await User.findByPk(userId);
  if (!user || !user.passwordHash || !(await bcrypt.compare(current, user.passwordHash))) {
    throw invalid({ currentPassword: 'This is not your current password' });
  }
  const problem = passwordProblem(next);
  if (problem) throw invalid({ newPassword: problem });
  user.passwordHash = await hashPassword(next);
  await inTransaction(async (transaction) => {
    await user.save({ transaction });
    await Session.destroy({ where: { userId, sid: { [Op.ne]: currentSessionId } }, transaction });
  });
}
