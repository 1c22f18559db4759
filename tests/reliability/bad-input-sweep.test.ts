// A generated bad-input sweep: fast-check bodies and query strings (wrong types, lists and
// objects where values belong, huge and odd strings, deep nesting) sent to every registered
// route, as anonymous and as each role. Not one may answer 5xx, and no business table may
// change. The route list comes from the router, so a new route is swept automatically.
import fs from 'node:fs';
import path from 'node:path';

import * as fc from 'fast-check';
import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import { type Role, ROLES } from '../../shared/roles';
import { claimFor, createJob, createSubmittedJob } from '../helpers/factories';
import { type Agent, clientAgent, resetSignInLimits, send, signedInAgent } from '../helpers/http';
import { registeredRoutes } from '../helpers/route-walk';

jest.setTimeout(300_000);

const app = createApp();
const FIGURES = path.resolve(__dirname, 'figures.json');
// Sign-in bookkeeping (sessions, attempt counters) is expected to move; everything else must not.
const BOOKKEEPING = new Set(['sessions', 'rate_limit_hits', 'SequelizeMeta']);

afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

async function checksums(): Promise<Record<string, string>> {
  const tables = await sequelize.query<Record<string, string>>('SHOW TABLES', { type: QueryTypes.SELECT });
  const names = tables.map((row) => Object.values(row)[0]).filter((name) => !BOOKKEEPING.has(name));
  const rows = await sequelize.query<{ Table: string; Checksum: string }>(`CHECKSUM TABLE ${names.map((n) => `\`${n}\``).join(', ')}`, {
    type: QueryTypes.SELECT,
  });
  return Object.fromEntries(rows.map((r) => [r.Table.split('.').pop()!, String(r.Checksum)]));
}

// Routes that take no input (any request is a valid one) or whose reading extends a claim:
// there is no bad input to send them, and a change they make is their job.
const INPUTLESS = new Set([
  'DELETE /api/session',
  'POST /api/jobs/:id/claim',
  'DELETE /api/jobs/:id/claim',
  'POST /api/second-reviews/:id/claim',
  'POST /api/outbox/:id/retry',
  'DELETE /api/jobs/:id/files/:fileId',
  'GET /api/jobs/:id/workspace',
  // Its input is an optional queue filter; unknown parameters are ignored, so a request
  // without a bad value is a valid one, and claiming the next record is its job.
  'POST /api/queue/claim-next',
  'POST /api/notifications/read-all',
  // Takes no input: any request from a manager is a valid refit, which writes a model version.
  'POST /api/risk-model/fit',
]);

// Values a careless or hostile client sends where a field is expected.
const badValue = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.integer(),
  fc.double({ noNaN: false }),
  fc.string({ maxLength: 40 }),
  fc.string({ minLength: 300, maxLength: 600 }),
  fc.constantFrom(
    '',
    ' ',
    '0',
    '-1',
    '1e309',
    '__proto__',
    'constructor',
    "'; DROP TABLE jobs; --",
    '<script>x</script>',
    'Küche–Süd',
    '\u0000',
  ),
  fc.array(fc.oneof(fc.integer(), fc.string({ maxLength: 10 })), { maxLength: 4 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.oneof(fc.integer(), fc.string({ maxLength: 8 })), { maxKeys: 3 }),
);
const FIELD_NAMES = [
  'decision',
  'scores',
  'status',
  'role',
  'technicianId',
  'priority',
  'dueAt',
  'email',
  'password',
  'kind',
  'response',
  'outcome',
  'toReviewerId',
  'jobIds',
  'units',
  'rooms',
  'page',
  'id',
  'token',
];
const body = fc.dictionary(fc.constantFrom(...FIELD_NAMES), badValue, { maxKeys: 6 });
const query = fc.array(
  fc.tuple(
    fc.constantFrom('page', 'pageSize', 'status', 'sort', 'dir', 'technicianId', 'from', 'to', 'revision', 'second', 'format'),
    fc.string({ maxLength: 12 }),
  ),
  {
    maxLength: 4,
  },
);

it('answers every generated bad request below 500 and changes no business table', async () => {
  const routes = registeredRoutes().filter((r) => !INPUTLESS.has(r));
  const agents: { who: 'anonymous' | Role; agent: Agent; id: number | null }[] = [{ who: 'anonymous', agent: clientAgent(app), id: null }];
  for (const role of ROLES) {
    const signed = await signedInAgent(app, role);
    agents.push({ who: role, agent: signed.agent, id: signed.user.id });
  }
  // Real ids, so requests get past "not found" to the validators and services.
  const technician = agents.find((a) => a.who === 'technician')!;
  const reviewer = agents.find((a) => a.who === 'reviewer')!;
  const ownJob = await createJob({ technicianId: technician.id! });
  const claimed = await claimFor(await createSubmittedJob(), reviewer.id!);
  const ids = [ownJob.id, claimed.id];

  const before = await checksums();
  const statuses: Record<string, number> = {};
  const serverErrors: string[] = [];
  let requests = 0;
  const samples = fc.sample(fc.tuple(fc.nat(), fc.nat(), body, query, fc.constantFrom(...ids, 0, -1, 99_999_999)), {
    numRuns: 1200,
    seed: 20261202,
  });
  for (const [routeIndex, agentIndex, payload, params, id] of samples) {
    const route = routes[routeIndex % routes.length];
    const { who, agent } = agents[agentIndex % agents.length];
    const [method, pattern] = route.split(' ');
    const search = params.map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join('&');
    const url = pattern.replace(/:[a-zA-Z]+/g, String(id)) + (search ? `?${search}` : '');
    const res = await send(agent, method, url, method === 'GET' ? undefined : payload, undefined, { 'If-Match': '"1"' });
    requests += 1;
    statuses[res.status] = (statuses[res.status] ?? 0) + 1;
    if (res.status >= 500) serverErrors.push(`${who} ${method} ${url} ${JSON.stringify(payload).slice(0, 200)} → ${res.status}`);
  }
  const after = await checksums();
  const changed = Object.keys(before).filter((t) => before[t] !== after[t]);

  const figures = {
    date: new Date().toISOString(),
    routes: routes.length,
    requests,
    statuses,
    serverErrors: serverErrors.length,
    tablesChanged: changed,
  };
  fs.writeFileSync(FIGURES, JSON.stringify(figures, null, 2));
  console.log(
    `reliability sweep: ${requests} requests over ${routes.length} routes, ${serverErrors.length} × 5xx, tables changed: ${changed.length ? changed.join(', ') : 'none'}`,
  );

  expect(requests).toBeGreaterThanOrEqual(1000);
  expect(serverErrors).toEqual([]);
  expect(changed).toEqual([]);
});
