// MariaDB restarted under a bounded write load: requests made while it is down get a clear
// 503, every write that was acknowledged is there afterwards, and the app recovers by itself.
import { execFileSync, spawn } from 'node:child_process';
import path from 'node:path';

import { createApp } from '../../server/app';
import { Job, sequelize } from '../../server/models';
import { createUser, newJobBody } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

jest.setTimeout(180_000);

const app = createApp();
const DB_DIR = path.join(process.env.DATA_DIR ?? path.resolve(__dirname, '..', '..', '.data'), 'mariadb');
const SOCKET = path.join(DB_DIR, 'run', 'mariadb.sock');

afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const ping = () => {
  try {
    execFileSync('mariadb-admin', ['--no-defaults', `--socket=${SOCKET}`, '-uroot', 'ping'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
};

async function waitUntil(check: () => boolean, timeoutMs: number) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (check()) return;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error('timed out');
}

// The same command the test script starts MariaDB with.
function startMariaDb() {
  const child = spawn(
    'mariadbd',
    [
      '--no-defaults',
      '--user=root',
      `--datadir=${DB_DIR}/data`,
      `--bind-address=${process.env.DB_HOST ?? '127.0.0.1'}`,
      `--port=${process.env.DB_PORT ?? '3407'}`,
      `--socket=${SOCKET}`,
      `--pid-file=${DB_DIR}/run/mariadb.pid`,
      `--tmpdir=${DB_DIR}/tmp`,
      `--log-error=${DB_DIR}/log/error.log`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.unref();
}

it('keeps every acknowledged write through a restart and recovers without one of its own', async () => {
  expect(ping()).toBe(true);
  const { agent } = await signedInAgent(app, 'manager');
  const technician = await createUser({ role: 'technician' });
  const acknowledged: string[] = [];
  const statuses: number[] = [];
  for (let i = 0; i < 60; i++) {
    if (i === 15) {
      execFileSync('mariadb-admin', ['--no-defaults', `--socket=${SOCKET}`, '-uroot', 'shutdown'], { stdio: 'ignore' });
      await waitUntil(() => !ping(), 30_000);
    }
    if (i === 25) {
      startMariaDb();
      await waitUntil(ping, 60_000);
    }
    const body = newJobBody(technician.id);
    const res = await agent.post('/api/jobs').send(body);
    statuses.push(res.status);
    if (res.status === 201) acknowledged.push(body.claimReference);
  }
  // While the database was away the answer was a clear 503, never a 500.
  expect(statuses.slice(15, 25).every((s) => s === 503)).toBe(true);
  expect(statuses.some((s) => s >= 500 && s !== 503)).toBe(false);
  // Recovered by itself: the last writes went through.
  expect(statuses.slice(-10).every((s) => s === 201)).toBe(true);
  expect(await Job.count({ where: { claimReference: acknowledged } })).toBe(acknowledged.length);
  console.log(
    `database restart: ${acknowledged.length} of ${statuses.length} writes acknowledged, all present; ${statuses.filter((s) => s === 503).length} × 503 while down`,
  );
});
