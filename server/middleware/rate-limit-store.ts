// express-rate-limit store backed by MariaDB, so that every instance behind the load
// balancer counts the same attempts (the package's default store lives in process memory).
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';

import { sequelize } from '../db';

export class MariaDbRateLimitStore implements Store {
  windowMs = 60_000;
  localKeys = false;

  constructor(readonly prefix: string) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  private key(key: string) {
    return `${this.prefix}:${key}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = await sequelize.query<{ hits: number; reset_at_ms: string }>(
      'SELECT hits, reset_at_ms FROM rate_limit_hits WHERE `key` = ? AND reset_at_ms > ?',
      { replacements: [this.key(key), Date.now()], type: QueryTypes.SELECT },
    );
    const row = rows[0];
    return row ? { totalHits: Number(row.hits), resetTime: new Date(Number(row.reset_at_ms)) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = Date.now();
    // One atomic upsert: an expired window starts again at 1. MariaDB evaluates the SET list
    // left to right, so `hits` is decided before `reset_at_ms` changes.
    await sequelize.query(
      `INSERT INTO rate_limit_hits (\`key\`, hits, reset_at_ms) VALUES (:key, 1, :reset)
       ON DUPLICATE KEY UPDATE
         hits = IF(reset_at_ms <= :now, 1, hits + 1),
         reset_at_ms = IF(reset_at_ms <= :now, :reset, reset_at_ms)`,
      { replacements: { key: this.key(key), reset: now + this.windowMs, now }, type: QueryTypes.INSERT },
    );
    return (await this.get(key)) ?? { totalHits: 1, resetTime: new Date(now + this.windowMs) };
  }

  async decrement(key: string): Promise<void> {
    await sequelize.query('UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE `key` = ?', {
      replacements: [this.key(key)],
      type: QueryTypes.UPDATE,
    });
  }

  async resetKey(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE `key` = ?', {
      replacements: [this.key(key)],
      type: QueryTypes.DELETE,
    });
  }
}
