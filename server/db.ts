import { DatabaseError, Sequelize, type Transaction } from 'sequelize';

import { config } from './config';

export const sequelize = new Sequelize(config.db.name, config.db.user, config.db.password, {
  dialect: 'mariadb',
  host: config.db.host,
  port: config.db.port,
  logging: false,
  // Every instance reads and writes times in UTC, whatever the host's zone.
  timezone: '+00:00',
  define: { underscored: true },
  pool: { max: 10, min: 0, idle: 10_000, acquire: 10_000 },
});

const LOCK_ERRNOS = new Set([1205, 1213]);
const isLockConflict = (error: unknown) =>
  error instanceof DatabaseError && LOCK_ERRNOS.has((error as { parent?: { errno?: number } }).parent?.errno ?? 0);

// A managed transaction that runs again, whole, when MariaDB chose it as a deadlock victim
// (1213) or its lock wait timed out (1205): the database rolled all of it back, so a fresh run
// is safe. Only the last failure reaches the caller (and becomes a 409).
export async function inTransaction<T>(work: (transaction: Transaction) => Promise<T>, attempts = 4): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await sequelize.transaction(work);
    } catch (error) {
      if (!isLockConflict(error) || attempt >= attempts) throw error;
      await new Promise((resolve) => setTimeout(resolve, 20 * attempt + Math.random() * 30));
    }
  }
}
