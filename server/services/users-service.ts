import bcrypt from 'bcryptjs';
import { QueryTypes } from 'sequelize';

import type { SessionUser, UserRow } from '../../shared/api-types';
import type { Role } from '../../shared/roles';
import { inTransaction } from '../db';
import { conflict, HttpError, notFound } from '../errors';
import { sequelize, Session, User } from '../models';

const BCRYPT_ROUNDS = 10;
// Compared against when the e-mail is unknown, so both paths take the same time.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_ROUNDS);

export function normaliseEmail(email: string) {
  return email.trim().toLowerCase();
}

export async function verifyCredentials(email: string, password: string): Promise<SessionUser | null> {
  const user = await User.findOne({ where: { email: normaliseEmail(email) } });
  const matches = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !matches || !user.active) return null;
  return user.toSessionUser();
}

// Once per request (passport's deserializeUser): one primary-key read of four columns.
export async function findActiveSessionUser(id: number): Promise<SessionUser | null> {
  const [user] = await sequelize.query<SessionUser>('SELECT id, name, email, role FROM users WHERE id = ? AND active = 1', {
    replacements: [id],
    type: QueryTypes.SELECT,
  });
  return user ? { id: Number(user.id), name: user.name, email: user.email, role: user.role } : null;
}

export async function listActiveReviewers(): Promise<{ id: number; name: string }[]> {
  const reviewers = await User.findAll({ where: { role: 'reviewer', active: true }, attributes: ['id', 'name'], order: [['name', 'ASC']] });
  return reviewers.map((r) => ({ id: r.id, name: r.name }));
}

export async function listUsers(): Promise<UserRow[]> {
  const users = await User.findAll({
    order: [
      ['role', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  return users.map((u) => u.toRow());
}

export async function createUser(input: { name: string; email: string; role: Role; password: string }): Promise<UserRow> {
  const email = normaliseEmail(input.email);
  if (await User.findOne({ where: { email } })) {
    throw new HttpError(409, 'conflict', 'An account with that e-mail already exists.', { email: 'Already in use' });
  }
  const user = await User.create({
    name: input.name.trim(),
    email,
    role: input.role,
    passwordHash: await bcrypt.hash(input.password, BCRYPT_ROUNDS),
  });
  return user.toRow();
}

export async function updateUser(actorId: number, id: number, changes: { role?: Role; active?: boolean }): Promise<UserRow> {
  if (actorId === id && (changes.active === false || (changes.role && changes.role !== 'admin'))) {
    throw conflict('You cannot deactivate yourself or remove your own admin role.');
  }
  return inTransaction(async (transaction) => {
    const user = await User.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('User');
    if (changes.role !== undefined) user.role = changes.role;
    if (changes.active !== undefined) user.active = changes.active;
    await user.save({ transaction });
    // A deactivated account is signed out everywhere, on every instance.
    if (changes.active === false) await Session.destroy({ where: { userId: id }, transaction });
    return user.toRow();
  });
}

export async function hashPassword(password: string) {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}
