// Two Sightline instances on one MariaDB behind HAProxy (Debian's package, on 127.0.0.1): a
// session made through one works on the other, fifty claims over both have one winner, both
// outbox workers deliver each message once, and killing one instance mid-load loses no write
// that was acknowledged.
import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { Job, OutboxMessage, sequelize } from '../../server/models';
import { createSubmittedJob, createUser, newJobBody, TEST_PASSWORD } from '../helpers/factories';
import { resetSignInLimits } from '../helpers/http';

jest.setTimeout(240_000);

const ROOT = path.resolve(__dirname, '..', '..');
const BASE_PORT = Number(process.env.PORT ?? 8091);
const PORTS = { a: BASE_PORT + 3, b: BASE_PORT + 4, lb: BASE_PORT + 5 };
const HAPROXY = ['/usr/sbin/haproxy', '/usr/bin/haproxy'].find((p) => fs.existsSync(p));
const run = HAPROXY ? describe : describe.skip;

const instances: Record<'a' | 'b', ChildProcess | null> = { a: null, b: null };
let haproxy: ChildProcess | null = null;

function startInstance(name: 'a' | 'b') {
  const child = spawn('node', ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: { ...process.env, PORT: String(PORTS[name]), INSTANCE_ID: `instance-${name}`, OUTBOX_INTERVAL_MS: '300' },
    stdio: 'ignore',
  });
  instances[name] = child;
  return child;
}

async function waitFor(url: string, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`${url} did not answer`);
}

const base = (port: number) => `http://127.0.0.1:${port}`;
const HEADERS = { 'content-type': 'application/json', 'x-sightline-request': '1' };

async function signIn(port: number, email: string) {
  const res = await fetch(`${base(port)}/api/session`, {
    method: 'POST',
    headers: HEADERS,
    body: JSON.stringify({ email, password: TEST_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in ${res.status}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

run('two instances behind HAProxy', () => {
  beforeAll(async () => {
    startInstance('a');
    startInstance('b');
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sightline-haproxy-'));
    const cfg = path.join(dir, 'haproxy.cfg');
    fs.writeFileSync(
      cfg,
      [
        'defaults',
        '    mode http',
        '    timeout connect 1s',
        '    timeout client 10s',
        '    timeout server 10s',
        '    retries 2',
        '    option redispatch 1',
        '    retry-on conn-failure empty-response response-timeout',
        'frontend fe',
        `    bind 127.0.0.1:${PORTS.lb}`,
        '    default_backend be',
        // A POST is never sent twice: only reads are retried on the other instance.
        '    http-request disable-l7-retry unless METH_GET || METH_HEAD || METH_OPTIONS',
        'backend be',
        '    balance roundrobin',
        '    option httpchk GET /api/health',
        '    http-check expect status 200',
        '    default-server inter 500ms fastinter 250ms downinter 1s fall 2 rise 2',
        `    server a 127.0.0.1:${PORTS.a} check`,
        `    server b 127.0.0.1:${PORTS.b} check`,
        '',
      ].join('\n'),
    );
    execFileSync(HAPROXY!, ['-c', '-f', cfg], { stdio: 'ignore' });
    haproxy = spawn(HAPROXY!, ['-f', cfg, '-db'], { stdio: 'ignore' });
    await waitFor(`${base(PORTS.a)}/api/health`);
    await waitFor(`${base(PORTS.b)}/api/health`);
    await waitFor(`${base(PORTS.lb)}/api/health`);
  });

  afterAll(async () => {
    haproxy?.kill('SIGKILL');
    instances.a?.kill('SIGKILL');
    instances.b?.kill('SIGKILL');
    await resetSignInLimits();
    await sequelize.close();
  });

  it('serves a session made through one instance on the other', async () => {
    const user = await createUser({ role: 'reviewer' });
    const cookie = await signIn(PORTS.a, user.email);
    const me = await fetch(`${base(PORTS.b)}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
    expect((await me.json()).user.email).toBe(user.email);
  });

  it('gives exactly one of fifty claims spread over both instances the job', async () => {
    const job = await createSubmittedJob();
    const reviewers = await Promise.all(Array.from({ length: 10 }, () => createUser({ role: 'reviewer' })));
    const cookies = await Promise.all(reviewers.map((r, i) => signIn(i % 2 ? PORTS.b : PORTS.a, r.email)));
    const statuses = await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        fetch(`${base(i % 2 ? PORTS.b : PORTS.a)}/api/jobs/${job.id}/claim`, {
          method: 'POST',
          headers: { ...HEADERS, cookie: cookies[i % 10] },
        }).then((r) => r.status),
      ),
    );
    // One reviewer may win several of its own requests; one reviewer only ends up holding it.
    const holder = (await Job.findByPk(job.id))!.claimedById;
    const winners = new Set(statuses.map((s, i) => (s === 200 ? reviewers[i % 10].id : null)).filter((id) => id !== null));
    expect(winners).toEqual(new Set([holder]));
    expect(statuses.every((s) => s === 200 || s === 409)).toBe(true);
  });

  it('delivers every message once with both outbox workers running', async () => {
    const stamp = `two-instances-${Date.now()}`;
    await OutboxMessage.bulkCreate(
      Array.from({ length: 12 }, (_, i) => ({
        jobId: null,
        kind: 'test',
        dedupeKey: null,
        recipients: ['someone@example.test'],
        subject: `${stamp} #${i}`,
        textBody: 'test',
        htmlBody: '<p>test</p>',
        nextAttemptAt: new Date(),
        lastError: null,
        lockedBy: null,
        lockedUntil: null,
        sentAt: null,
      })),
    );
    const until = Date.now() + 30_000;
    while (Date.now() < until && (await OutboxMessage.count({ where: { kind: 'test', status: 'pending' } })) > 0)
      await new Promise((r) => setTimeout(r, 300));
    const messages = (await (await fetch(`${process.env.MAILBOX_URL}/messages`)).json()) as { subject: string }[];
    const mine = messages.filter((m) => m.subject.startsWith(stamp));
    expect(mine).toHaveLength(12);
    expect(new Set(mine.map((m) => m.subject)).size).toBe(12);
  });

  it('loses no acknowledged write when one instance is killed mid-load', async () => {
    const manager = await createUser({ role: 'manager' });
    const technician = await createUser({ role: 'technician' });
    const cookie = await signIn(PORTS.lb, manager.email);
    const acknowledged: string[] = [];
    let failed = 0;
    for (let i = 0; i < 40; i++) {
      if (i === 12) instances.a?.kill('SIGKILL');
      const body = newJobBody(technician.id);
      try {
        const res = await fetch(`${base(PORTS.lb)}/api/jobs`, {
          method: 'POST',
          headers: { ...HEADERS, cookie },
          body: JSON.stringify(body),
        });
        if (res.status === 201) acknowledged.push(body.claimReference);
        else failed += 1;
      } catch {
        failed += 1;
      }
    }
    // HAProxy took the dead instance out: most writes went through, and every acknowledged one is there.
    expect(acknowledged.length).toBeGreaterThanOrEqual(30);
    expect(failed).toBeLessThanOrEqual(10);
    const stored = await Job.count({ where: { claimReference: acknowledged } });
    expect(stored).toBe(acknowledged.length);
  });
});
