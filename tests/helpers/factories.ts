import crypto from 'node:crypto';
import type { Role } from '../../shared/roles';
import { User } from '../../server/models';
import { hashPassword } from '../../server/services/users-service';

export const TEST_PASSWORD = 'correct-horse-battery';
let passwordHash: Promise<string> | undefined;

export function uniqueEmail(prefix = 'person') {
  return `${prefix}-${crypto.randomUUID().slice(0, 8)}@example.test`;
}

export async function createUser(overrides: Partial<{ role: Role; name: string; email: string; active: boolean }> = {}) {
  passwordHash ??= hashPassword(TEST_PASSWORD);
  const role = overrides.role ?? 'technician';
  return User.create({
    name: overrides.name ?? `Test ${role}`,
    email: overrides.email ?? uniqueEmail(role),
    role,
    active: overrides.active ?? true,
    passwordHash: await passwordHash,
  });
}
