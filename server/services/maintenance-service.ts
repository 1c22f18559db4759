// Housekeeping any instance may run: expired sign-in counters and sessions go. Idempotent, so
// several instances running it at once do no harm.
import { QueryTypes } from 'sequelize';

import { sequelize } from '../db';

export async function purgeExpired(now = new Date()) {
  await sequelize.query('DELETE FROM rate_limit_hits WHERE reset_at_ms < ?', { replacements: [now.getTime()], type: QueryTypes.DELETE });
  await sequelize.query('DELETE FROM sessions WHERE expires < ?', { replacements: [now], type: QueryTypes.DELETE });
}
