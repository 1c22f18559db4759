// Sessions in MariaDB, written only when something changed or once a minute: with a rolling
// idle timeout express-session would otherwise "touch" the row (an UPDATE) on every request.
// The time of the last write travels in the session itself (touchedAt), so any instance can
// tell without keeping anything in memory. The row's expiry may lag the cookie's by up to
// TOUCH_EVERY_MS, which only shortens an idle session by that much.
import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import { QueryTypes } from 'sequelize';

import { config } from '../config';
import { sequelize } from '../db';

export const TOUCH_EVERY_MS = 60_000;

const SequelizeStore = connectSessionSequelize(session.Store);
type Data = session.SessionData & { touchedAt?: number; passport?: { user?: number } };
type Callback = (err?: unknown) => void;

class ThrottledSessionStore extends SequelizeStore {
  // Read on every request: one primary-key lookup of the data column, no model instance, and
  // a row past its expiry is no session even before the clean-up removes it.
  get = (sid: string, callback: (err: unknown, session?: Data | null) => void) => {
    sequelize
      .query<{ data: string | null }>('SELECT data FROM sessions WHERE sid = ? AND expires > UTC_TIMESTAMP()', {
        replacements: [sid],
        type: QueryTypes.SELECT,
      })
      .then(([row]) => callback(null, row?.data ? (JSON.parse(row.data) as Data) : null))
      .catch((error) => callback(error));
  };

  set = (sid: string, data: Data, callback?: Callback) => {
    data.touchedAt = Date.now();
    return SequelizeStore.prototype.set.call(this, sid, data, callback);
  };

  touch = (sid: string, data: Data, callback?: Callback) => {
    if (data.touchedAt !== undefined && Date.now() - data.touchedAt < TOUCH_EVERY_MS) return callback?.();
    // A full write: the new expiry, and touchedAt with it.
    return this.set(sid, data, callback);
  };
}

export function createSessionStore() {
  return new ThrottledSessionStore({
    db: sequelize,
    table: 'Session',
    // Expired rows are removed by whichever instance runs next; harmless when several do.
    checkExpirationInterval: config.isTest ? 0 : 15 * 60_000,
    expiration: config.sessionMaxAgeHours * 3_600_000,
    extendDefaultFields: (defaults: { data: string; expires: Date }, sess: Data) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: sess.passport?.user ?? null,
    }),
  });
}
