// Account lifecycle by e-mail: invitation, forgotten password, change of password, password rules.
import { createApp } from '../../server/app';
import { passwordProblem } from '../../server/auth/password-policy';
import { OutboxMessage, PasswordToken, sequelize, Session, User } from '../../server/models';
import { createUser, TEST_PASSWORD, uniqueEmail } from '../helpers/factories';
import { clientAgent, countRows, resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

// The link as the e-mail carries it (the database keeps only its hash).
async function linkSentTo(email: string, kind: 'invitation' | 'password_reset') {
  const rows = await OutboxMessage.findAll({ where: { kind }, order: [['id', 'DESC']], limit: 20 });
  const message = rows.find((m) => m.recipients.includes(email));
  const token = /set-password\?token=([\w-]+)/.exec(message?.textBody ?? '')?.[1];
  return { message, token };
}

describe('password rules (OWASP ASVS 4.0 V2.1)', () => {
  it('asks for 12 characters, at most 72 bytes, and no common password', () => {
    expect(passwordProblem('short-pass1')).toBe('Use at least 12 characters');
    expect(passwordProblem('é'.repeat(40))).toMatch(/at most 72 bytes/);
    expect(passwordProblem('password1234')).toMatch(/most common/);
    expect(passwordProblem('Gravel-lantern-owl-2026')).toBeNull();
  });
});

describe('invitation', () => {
  it('e-mails a single-use link with which the new person sets a password and signs in', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const email = uniqueEmail('invited');
    expect((await agent.post('/api/users').send({ name: 'Invited Person', email, role: 'technician' })).status).toBe(201);
    const { message, token } = await linkSentTo(email, 'invitation');
    expect(message!.subject).toBe('Your Sightline account');
    expect(token).toBeDefined();
    // Only the hash is stored.
    expect(await PasswordToken.count({ where: { tokenHash: token! } })).toBe(0);

    const set = await clientAgent(app).post('/api/password/reset').send({ token, password: 'Gravel-lantern-owl-2026' });
    expect(set.status).toBe(200);
    expect((await clientAgent(app).post('/api/session').send({ email, password: 'Gravel-lantern-owl-2026' })).status).toBe(200);
    // Single use.
    expect((await clientAgent(app).post('/api/password/reset').send({ token, password: 'Another-lantern-owl-2026' })).status).toBe(410);
  });

  it('refuses a common password from the link, naming the field, and keeps the link usable', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const email = uniqueEmail('invited');
    await agent.post('/api/users').send({ name: 'Invited Person', email, role: 'reviewer' });
    const { token } = await linkSentTo(email, 'invitation');
    const weak = await clientAgent(app).post('/api/password/reset').send({ token, password: 'password1234' });
    expect(weak.status).toBe(400);
    expect(Object.keys(weak.body.error.fields)).toEqual(['password']);
    expect((await clientAgent(app).post('/api/password/reset').send({ token, password: 'Gravel-lantern-owl-2026' })).status).toBe(200);
  });
});

describe('forgotten password', () => {
  it('answers the same for a known and an unknown address, and mails only the known one', async () => {
    const user = await createUser();
    const before = await countRows('outbox');
    const known = await clientAgent(app).post('/api/password/forgot').send({ email: user.email });
    const unknown = await clientAgent(app)
      .post('/api/password/forgot')
      .send({ email: uniqueEmail('nobody') });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    expect(await countRows('outbox')).toBe(before + 1);
    await resetSignInLimits();
  });

  it('lifts the sign-in lock and ends every session when the owner sets a new password', async () => {
    const user = await createUser();
    const other = clientAgent(app);
    await other.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    // Enough wrong passwords that each further attempt is slowed down.
    for (let i = 0; i < 6; i++) await clientAgent(app).post('/api/session').send({ email: user.email, password: 'wrong-password-here' });

    await clientAgent(app).post('/api/password/forgot').send({ email: user.email });
    const { token } = await linkSentTo(user.email, 'password_reset');
    expect((await clientAgent(app).post('/api/password/reset').send({ token, password: 'Fresh-lantern-owl-2026' })).status).toBe(200);
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    expect((await other.get('/api/me')).status).toBe(401);
    // The slow-down is lifted at once: the next sign-in is answered without a delay.
    const started = Date.now();
    expect((await clientAgent(app).post('/api/session').send({ email: user.email, password: 'Fresh-lantern-owl-2026' })).status).toBe(200);
    expect(Date.now() - started).toBeLessThan(450);
    await resetSignInLimits();
  });

  it('refuses an expired link (410)', async () => {
    const user = await createUser();
    await clientAgent(app).post('/api/password/forgot').send({ email: user.email });
    const { token } = await linkSentTo(user.email, 'password_reset');
    await PasswordToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    expect((await clientAgent(app).post('/api/password/reset').send({ token, password: 'Fresh-lantern-owl-2026' })).status).toBe(410);
    await resetSignInLimits();
  });
});

describe('PUT /api/me/password', () => {
  it('needs the current password, and ends the other sessions but not this one', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const phone = clientAgent(app);
    await phone.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    const wrong = await agent.put('/api/me/password').send({ currentPassword: 'not-my-password', newPassword: 'Gravel-lantern-owl-2026' });
    expect(wrong.status).toBe(400);
    expect(Object.keys(wrong.body.error.fields)).toEqual(['currentPassword']);
    expect(
      (await agent.put('/api/me/password').send({ currentPassword: TEST_PASSWORD, newPassword: 'Gravel-lantern-owl-2026' })).status,
    ).toBe(204);
    expect((await agent.get('/api/me')).status).toBe(200);
    expect((await phone.get('/api/me')).status).toBe(401);
    expect((await User.findByPk(user.id))!.passwordHash).not.toBeNull();
  });
});
