// A signed-in request writes nothing to the sessions table unless the session changed or a
// minute has passed since the last write (the rolling idle timeout is kept that way).
import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { TOUCH_EVERY_MS } from '../../server/auth/session-store';
import { sequelize } from '../../server/models';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

async function sessionRow(userId: number) {
  const [row] = await sequelize.query<{ sid: string; expires: Date; updated_at: Date; data: string }>(
    'SELECT sid, expires, updated_at, data FROM sessions WHERE user_id = ?',
    { replacements: [userId], type: QueryTypes.SELECT },
  );
  return row;
}

it('does not write the session row on every request, and does once it is a minute old', async () => {
  const { agent, user } = await signedInAgent(app, 'reviewer');
  const before = await sessionRow(user.id);
  expect(JSON.parse(before.data).touchedAt).toEqual(expect.any(Number));
  for (let i = 0; i < 5; i++) expect((await agent.get('/api/me')).status).toBe(200);
  const after = await sessionRow(user.id);
  expect(after.expires.getTime()).toBe(before.expires.getTime());
  expect(after.updated_at.getTime()).toBe(before.updated_at.getTime());

  // As if the last write were older than the interval: the next request extends the expiry.
  const old = Date.now() - TOUCH_EVERY_MS - 1_000;
  await sequelize.query(
    `UPDATE sessions SET data = JSON_SET(data, '$.touchedAt', ?), expires = expires - INTERVAL 5 MINUTE WHERE sid = ?`,
    {
      replacements: [old, before.sid],
      type: QueryTypes.UPDATE,
    },
  );
  expect((await agent.get('/api/me')).status).toBe(200);
  const touched = await sessionRow(user.id);
  expect(touched.expires.getTime()).toBeGreaterThan(before.expires.getTime() - 60_000);
  expect(JSON.parse(touched.data).touchedAt).toBeGreaterThan(old);
});

it('still signs out: a destroyed session is gone at once', async () => {
  const { agent, user } = await signedInAgent(app, 'technician');
  expect((await agent.delete('/api/session')).status).toBeLessThan(300);
  expect(await sessionRow(user.id)).toBeUndefined();
  expect((await agent.get('/api/me')).status).toBe(401);
});
