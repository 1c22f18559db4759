import { createApp } from '../../server/app';
import { SIGN_IN_FAILED } from '../../server/auth/passport';
import { config } from '../../server/config';
import { sequelize, Session } from '../../server/models';
import { createUser, TEST_PASSWORD, uniqueEmail } from '../helpers/factories';
import { clientAgent, resetSignInLimits } from '../helpers/http';

const app = createApp();

beforeEach(resetSignInLimits);
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('POST /api/session', () => {
  it('signs in with the right password and sets an httpOnly, SameSite=Lax cookie', async () => {
    const user = await createUser({ role: 'reviewer' });
    const res = await clientAgent(app).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: user.id, name: user.name, email: user.email, role: 'reviewer' });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/sightline\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const user = await createUser();
    const res = await clientAgent(app)
      .post('/api/session')
      .send({ email: `  ${user.email.toUpperCase()} `, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });

  it('refuses a wrong password with the same message as an unknown e-mail', async () => {
    const user = await createUser();
    const wrong = await clientAgent(app).post('/api/session').send({ email: user.email, password: 'not-the-password' });
    const unknown = await clientAgent(app)
      .post('/api/session')
      .send({ email: uniqueEmail('nobody'), password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.message).toBe(SIGN_IN_FAILED);
  });

  it('refuses a deactivated user with the same message', async () => {
    const user = await createUser({ active: false });
    const res = await clientAgent(app).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe(SIGN_IN_FAILED);
  });

  it('issues a new session id at sign-in', async () => {
    const user = await createUser();
    const agent = clientAgent(app);
    const first = await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const second = await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const sid = (r: typeof first) => /sightline\.sid=([^;]+)/.exec(String(r.headers['set-cookie']))?.[1];
    expect(sid(first)).toBeTruthy();
    expect(sid(second)).toBeTruthy();
    expect(sid(second)).not.toBe(sid(first));
  });

  it('names the fields when the input is malformed', async () => {
    const res = await clientAgent(app).post('/api/session').send({ email: 'not-an-email' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('slows repeated failures on an account down progressively, but never locks its owner out', async () => {
    const user = await createUser();
    for (let i = 0; i < config.signInLimits.failuresPerAccount; i++) {
      const res = await clientAgent(app)
        .post('/api/session')
        .send({ email: user.email, password: `wrong-${i}` });
      expect(res.status).toBe(401);
    }
    const timed = async (password: string) => {
      const started = Date.now();
      const res = await clientAgent(app).post('/api/session').send({ email: user.email, password });
      return { status: res.status, ms: Date.now() - started };
    };
    const first = await timed('wrong-again');
    const second = await timed('wrong-once-more');
    expect(first.status).toBe(401);
    expect(first.ms).toBeGreaterThanOrEqual(450);
    expect(second.ms).toBeGreaterThanOrEqual(950);
    // The right password still works: someone typing wrong passwords for you cannot lock you out.
    expect((await timed(TEST_PASSWORD)).status).toBe(200);
    await resetSignInLimits();
  });

  it('counts an accented or differently cased e-mail against the same account', async () => {
    const user = await createUser({ email: `tess-${Date.now()}@example.test` });
    const variants = [user.email.toUpperCase(), user.email.replace('e', 'é'), user.email.replace('s', 'ś'), user.email, user.email];
    for (const email of variants) await clientAgent(app).post('/api/session').send({ email, password: 'wrong-password' });
    const started = Date.now();
    await clientAgent(app).post('/api/session').send({ email: user.email, password: 'wrong-password' });
    expect(Date.now() - started).toBeGreaterThanOrEqual(450);
    await resetSignInLimits();
  });

  it('limits failures per address across many accounts', async () => {
    for (let i = 0; i < config.signInLimits.failuresPerIp; i++) {
      await clientAgent(app)
        .post('/api/session')
        .send({ email: uniqueEmail('guess'), password: 'guessing-pw' });
    }
    const user = await createUser();
    const blocked = await clientAgent(app).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
  }, 60_000);

  it('refuses a state-changing request without the same-origin header', async () => {
    const user = await createUser();
    const { default: request } = await import('supertest');
    const res = await request(app).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_rejected');
  });

  it('refuses a request whose Origin is another site', async () => {
    const user = await createUser();
    const res = await clientAgent(app)
      .post('/api/session')
      .set('origin', 'https://elsewhere.example')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
  });
});

describe('DELETE /api/session', () => {
  it('signs out and removes the session row', async () => {
    const user = await createUser();
    const agent = clientAgent(app);
    await agent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(await Session.count({ where: { userId: user.id } })).toBe(1);
    expect((await agent.delete('/api/session')).status).toBe(204);
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});

describe('GET /api/me', () => {
  it('answers 401 with the error shape when nobody is signed in', async () => {
    const res = await clientAgent(app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'not_signed_in', message: 'Please sign in.' } });
  });

  it('keeps the session across a server restart, because it lives in MariaDB', async () => {
    const user = await createUser({ role: 'manager' });
    const before = clientAgent(app);
    const signIn = await before.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const cookie = String(signIn.headers['set-cookie']).split(';')[0];

    // A second, freshly built app shares nothing in memory with the first.
    const restarted = createApp();
    const res = await clientAgent(restarted).get('/api/me').set('cookie', cookie);
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(user.id);
  });
});

describe('GET /api/health', () => {
  it('reports the database as reachable', async () => {
    const res = await clientAgent(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'reachable' });
  });
});

describe('e-mail matching', () => {
  it('does not sign in with an accented variant of the address (stored and compared byte for byte)', async () => {
    const { createUser: make, TEST_PASSWORD: password } = await import('../helpers/factories');
    const user = await make({ email: `tess-${Date.now()}@example.test` });
    const variant = user.email.replace('e', 'ë');
    const res = await clientAgent(app).post('/api/session').send({ email: variant, password });
    expect(res.status).toBe(401);
    expect((await clientAgent(app).post('/api/session').send({ email: user.email.toUpperCase(), password })).status).toBe(200);
    await resetSignInLimits();
  });
});
