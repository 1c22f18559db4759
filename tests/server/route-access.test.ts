// Walks every registered API route as anonymous and as each role, and checks the answer:
// 2xx where the role is allowed, 401 for anonymous, 403 for a role that is not.
// A route missing from ROUTES fails the first test, so no route ships unchecked.
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import { ROLES, type Role } from '../../shared/roles';
import { createUser, TEST_PASSWORD } from '../helpers/factories';
import { clientAgent, resetSignInLimits, signedInAgent, type Agent } from '../helpers/http';
import { registeredRoutes } from '../helpers/route-walk';

type Who = 'anonymous' | Role;
const EVERYONE: Who[] = ['anonymous', ...ROLES];

type RouteCase = {
  allowed: Who[];
  // Builds what a valid request needs (rows, ids); `me` is the signed-in user, if any.
  prepare?: (me: { id: number; role: Role } | null) => Promise<{ path?: string; body?: object }>;
};

const app: Express = createApp();

afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const ROUTES: Record<string, RouteCase> = {
  'GET /api/health': { allowed: EVERYONE },
  'POST /api/session': {
    allowed: EVERYONE,
    prepare: async () => {
      const user = await createUser();
      return { body: { email: user.email, password: TEST_PASSWORD } };
    },
  },
  'DELETE /api/session': { allowed: [...ROLES] },
  'GET /api/me': { allowed: [...ROLES] },
  'GET /api/users': { allowed: ['admin'] },
  'POST /api/users': {
    allowed: ['admin'],
    prepare: async () => ({
      body: { name: 'New Person', email: `new-${Date.now()}-${Math.random()}@example.test`.replace('0.', ''), role: 'reviewer', password: 'long-enough-password' },
    }),
  },
  'PATCH /api/users/:id': {
    allowed: ['admin'],
    prepare: async () => ({ path: `/api/users/${(await createUser()).id}`, body: { role: 'reviewer' } }),
  },
};

describe('API route access', () => {
  it('has an access rule for every registered route, and no rule for a route that is gone', () => {
    expect(Object.keys(ROUTES).sort()).toEqual(registeredRoutes());
  });

  for (const [route, spec] of Object.entries(ROUTES)) {
    const [method, pattern] = route.split(' ');
    for (const who of EVERYONE) {
      const expected = spec.allowed.includes(who) ? '2xx' : who === 'anonymous' ? 401 : 403;
      it(`${route} as ${who} answers ${expected}`, async () => {
        let agent: Agent;
        let me: { id: number; role: Role } | null = null;
        if (who === 'anonymous') {
          agent = clientAgent(app);
        } else {
          const signed = await signedInAgent(app, who);
          agent = signed.agent;
          me = { id: signed.user.id, role: who };
        }
        const prepared = spec.prepare ? await spec.prepare(me) : {};
        const path = prepared.path ?? pattern;
        const call = (agent as unknown as Record<string, (p: string) => Agent>)[method.toLowerCase()](path);
        const res = await (prepared.body ? (call as unknown as { send: (b: object) => Promise<{ status: number; body: unknown }> }).send(prepared.body) : call);
        if (expected === '2xx') {
          if (res.status < 200 || res.status >= 300) throw new Error(`expected 2xx, got ${res.status} ${JSON.stringify(res.body)}`);
        } else {
          expect(res.status).toBe(expected);
        }
      });
    }
  }
});
