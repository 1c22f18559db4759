// Object storage stopped (nothing listens) and silent (it accepts connections but never
// answers): uploads and downloads answer 503 storage_unavailable quickly, and nothing is
// half-written. Each case runs a Sightline instance pointed at the broken storage.
import { type ChildProcess, spawn } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';

import { sequelize, StoredFile } from '../../server/models';
import { createJob, createStoredFile, createUser, TEST_PASSWORD } from '../helpers/factories';
import { resetSignInLimits } from '../helpers/http';
import { PNG_1X1 } from '../helpers/sample-files';

jest.setTimeout(120_000);

const ROOT = path.resolve(__dirname, '..', '..');
const BASE_PORT = Number(process.env.PORT ?? 8091);
const REQUEST_TIMEOUT_MS = 1500;

const children: ChildProcess[] = [];
let silent: net.Server;
const sockets: net.Socket[] = [];

async function freePort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as net.AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

async function instanceWithStorage(port: number, storagePort: number) {
  const child = spawn('node', ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      PORT: String(port),
      S3_ENDPOINT: `http://127.0.0.1:${storagePort}`,
      S3_CONNECT_TIMEOUT_MS: '500',
      S3_REQUEST_TIMEOUT_MS: String(REQUEST_TIMEOUT_MS),
      OUTBOX_INTERVAL_MS: '0',
    },
    stdio: 'ignore',
  });
  children.push(child);
  const until = Date.now() + 60_000;
  while (Date.now() < until) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return `http://127.0.0.1:${port}`;
    } catch {
      // starting
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error('instance did not start');
}

async function technicianSession(base: string) {
  const user = await createUser({ role: 'technician' });
  const res = await fetch(`${base}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-sightline-request': '1' },
    body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
  });
  return {
    user,
    cookie: res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; '),
  };
}

async function upload(base: string, cookie: string, jobId: number) {
  const form = new FormData();
  form.append('kind', 'photo');
  form.append('file', new Blob([PNG_1X1], { type: 'image/png' }), 'ceiling.png');
  const started = Date.now();
  const res = await fetch(`${base}/api/jobs/${jobId}/files`, {
    method: 'POST',
    headers: { cookie, 'x-sightline-request': '1' },
    body: form,
  });
  return { status: res.status, body: (await res.json()) as { error?: { code: string } }, ms: Date.now() - started };
}

beforeAll(async () => {
  // Accepts connections and never says a word.
  silent = net.createServer((socket) => sockets.push(socket));
  await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
});

afterAll(async () => {
  for (const child of children) child.kill('SIGKILL');
  for (const socket of sockets) socket.destroy();
  silent.close();
  await resetSignInLimits();
  await sequelize.close();
});

describe.each([
  ['stopped', async () => freePort(), BASE_PORT + 6],
  ['silent', async () => (silent.address() as net.AddressInfo).port, BASE_PORT + 7],
])('object storage %s', (_name, storagePort, appPort) => {
  let base: string;
  beforeAll(async () => {
    base = await instanceWithStorage(appPort, await storagePort());
  });

  it('answers an upload with 503 storage_unavailable, fast, and stores no file row', async () => {
    const { user, cookie } = await technicianSession(base);
    const job = await createJob({ technicianId: user.id });
    const res = await upload(base, cookie, job.id);
    expect(res.status).toBe(503);
    expect(res.body.error?.code).toBe('storage_unavailable');
    // Two attempts at most, each bounded by the request timeout: no hang.
    expect(res.ms).toBeLessThan(4 * REQUEST_TIMEOUT_MS + 3000);
    expect(await StoredFile.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('answers a download with 503 storage_unavailable, fast', async () => {
    const { user, cookie } = await technicianSession(base);
    const job = await createJob({ technicianId: user.id });
    const file = await createStoredFile(job.id, user.id);
    const started = Date.now();
    const res = await fetch(`${base}/api/files/${file.id}`, { headers: { cookie } });
    expect(res.status).toBe(503);
    expect(Date.now() - started).toBeLessThan(4 * REQUEST_TIMEOUT_MS + 3000);
  });
});
