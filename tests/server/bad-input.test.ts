// Every write route refuses malformed input with 400, names the fields, and writes nothing.
// A write route missing from CASES fails the first test.
import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import type { Role } from '../../shared/roles';
import { createUser } from '../helpers/factories';
import { countRows, resetSignInLimits, signedInAgent } from '../helpers/http';
import { registeredRoutes } from '../helpers/route-walk';

type BadInputCase = {
  as: Role | 'anonymous';
  // Tables whose row counts must not change.
  tables: string[];
  prepare?: (me: { id: number }) => Promise<{ path?: string }>;
  body: object;
  fields: string[];
};

// Routes that take no input at all.
const NO_INPUT = ['DELETE /api/session'];

const CASES: Record<string, BadInputCase> = {
  'POST /api/session': { as: 'anonymous', tables: ['sessions'], body: { email: 'no', password: '' }, fields: ['email', 'password'] },
  'POST /api/users': { as: 'admin', tables: ['users'], body: { name: '', email: 'x@', role: 'chief', password: '1' }, fields: ['email', 'name', 'password', 'role'] },
  'PATCH /api/users/:id': {
    as: 'admin',
    tables: ['users'],
    prepare: async () => ({ path: `/api/users/${(await createUser()).id}` }),
    body: { role: 'chief', active: 'yes' },
    fields: ['active', 'role'],
  },
};

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('bad input on write routes', () => {
  it('has a case for every write route', () => {
    const writes = registeredRoutes().filter((r) => !r.startsWith('GET ') && !NO_INPUT.includes(r));
    expect(Object.keys(CASES).sort()).toEqual(writes);
  });

  for (const [route, spec] of Object.entries(CASES)) {
    const [method, pattern] = route.split(' ');
    it(`${route} answers 400 naming ${spec.fields.join(', ')} and writes nothing`, async () => {
      const { default: request } = await import('supertest');
      const signed = spec.as === 'anonymous' ? null : await signedInAgent(app, spec.as);
      const agent = signed?.agent ?? request.agent(app).set('x-sightline-request', '1');
      const path = (spec.prepare && signed ? (await spec.prepare(signed.user)).path : undefined) ?? pattern;
      const before = await Promise.all(spec.tables.map(countRows));
      const res = await (agent as unknown as Record<string, (p: string) => { send: (b: object) => Promise<{ status: number; body: { error: { fields: object } } }> }>)[method.toLowerCase()](path).send(spec.body);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields).sort()).toEqual(spec.fields);
      expect(await Promise.all(spec.tables.map(countRows))).toEqual(before);
    });
  }
});
