import bcrypt from 'bcryptjs';
import type { QueryInterface } from 'sequelize';

import { DEMO_PASSWORD, DEMO_PEOPLE } from './data/demo-people';

// Re-runnable: INSERT IGNORE on the unique e-mail never duplicates a person or resets a
// password somebody changed.
export async function up(queryInterface: QueryInterface) {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const now = new Date();
  await queryInterface.bulkInsert(
    'users',
    DEMO_PEOPLE.map((p) => ({ ...p, password_hash: passwordHash, active: true, created_at: now, updated_at: now })),
    { ignoreDuplicates: true } as object,
  );
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.bulkDelete('users', { email: DEMO_PEOPLE.map((p) => p.email) });
}
