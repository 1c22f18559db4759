import { createApp } from '../../server/app';
import { sequelize, Session, User } from '../../server/models';
import { createUser, TEST_PASSWORD, uniqueEmail } from '../helpers/factories';
import { clientAgent, countRows, resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('GET /api/users', () => {
  it('lists users without their password hashes', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const res = await agent.get('/api/users');
    expect(res.status).toBe(200);
    expect(res.body.users.length).toBeGreaterThan(0);
    expect(JSON.stringify(res.body)).not.toMatch(/password/i);
  });
});

describe('POST /api/users', () => {
  it('creates a user with no password, who cannot sign in until they set one from the invitation', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const email = uniqueEmail('created');
    const res = await agent.post('/api/users').send({ name: 'Created Person', email, role: 'reviewer' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, role: 'reviewer', active: true });
    const signIn = await clientAgent(app).post('/api/session').send({ email, password: 'a-long-password' });
    expect(signIn.status).toBe(401);
    await resetSignInLimits();
  });

  it('refuses bad input, names every field and writes nothing', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const before = await countRows('users');
    const res = await agent.post('/api/users').send({ name: 'x', email: 'nope', role: 'pilot' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'role']);
    expect(await countRows('users')).toBe(before);
  });

  it('refuses a duplicate e-mail with 409 and writes nothing', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const existing = await createUser();
    const before = await countRows('users');
    const res = await agent.post('/api/users').send({ name: 'Twin', email: existing.email, role: 'technician' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields).toEqual({ email: 'Already in use' });
    expect(await countRows('users')).toBe(before);
  });
});

describe('PATCH /api/users/:id', () => {
  it('changes a role', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const user = await createUser({ role: 'technician' });
    const res = await agent.patch(`/api/users/${user.id}`).send({ role: 'manager' });
    expect(res.status).toBe(200);
    expect((await User.findByPk(user.id))!.role).toBe('manager');
  });

  it("deactivating ends the user's sessions and blocks sign-in", async () => {
    const { agent: admin } = await signedInAgent(app, 'admin');
    const user = await createUser();
    const userAgent = clientAgent(app);
    await userAgent.post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect((await userAgent.get('/api/me')).status).toBe(200);

    const res = await admin.patch(`/api/users/${user.id}`).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.user.active).toBe(false);
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    expect((await userAgent.get('/api/me')).status).toBe(401);
    const again = await clientAgent(app).post('/api/session').send({ email: user.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  it('refuses bad input and an empty change, writing nothing', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const user = await createUser({ role: 'technician' });
    const bad = await agent.patch(`/api/users/${user.id}`).send({ role: 'boss', active: 'maybe' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['active', 'role']);
    const empty = await agent.patch(`/api/users/${user.id}`).send({});
    expect(empty.status).toBe(400);
    const badId = await agent.patch('/api/users/abc').send({ role: 'reviewer' });
    expect(badId.body.error.fields).toHaveProperty('id');
    const reloaded = await User.findByPk(user.id);
    expect(reloaded!.role).toBe('technician');
    expect(reloaded!.active).toBe(true);
  });

  it('does not let an admin deactivate themselves', async () => {
    const { agent, user } = await signedInAgent(app, 'admin');
    const res = await agent.patch(`/api/users/${user.id}`).send({ active: false });
    expect(res.status).toBe(409);
    expect((await User.findByPk(user.id))!.active).toBe(true);
  });

  it('answers 404 for a user that does not exist', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const res = await agent.patch('/api/users/99999999').send({ role: 'reviewer' });
    expect(res.status).toBe(404);
  });
});
