// npm run bench [-- --quick]: Sightline's figures at a firm's volume, each beside the limit
// of the same machine, in one interleaved run. Provisioned by scripts/bench/run.sh (its own
// database, sightline_bench). Prints one table and writes it as JSON under .data/bench/.
import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { QueryTypes } from 'sequelize';

import { sequelize } from '../../server/db';
import { weekSpan } from '../../shared/trends';
import { measureFirstLoad } from './first-load';
import { type LoadResult, runLoad } from './load';
import { BENCH_PASSWORD, seedBenchData } from './seed';
import { benchStations, type StationFigures } from './stations';

const quick = process.argv.includes('--quick');
const SCALE = quick ? 0.1 : 1;
const DURATION_S = quick ? 1 : 5;
const CONNECTIONS = [1, 8, 32];
const APP_PORT = Number(process.env.BENCH_APP_PORT ?? 8097);
const LIMIT_PORT = Number(process.env.BENCH_LIMIT_PORT ?? 8098);
const APP = `http://127.0.0.1:${APP_PORT}`;
const LIMIT = `http://127.0.0.1:${LIMIT_PORT}`;
const ROOT = path.resolve(__dirname, '..', '..');

function start(script: string[], env: Record<string, string>, port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', ...script], {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    const deadline = Date.now() + 30_000;
    const poll = () =>
      fetch(`http://127.0.0.1:${port}/`)
        .then(() => resolve(child))
        .catch(() => (Date.now() > deadline ? reject(new Error(`${script[0]} did not start`)) : setTimeout(poll, 200)));
    poll();
  });
}

async function signIn(email: string): Promise<string> {
  const res = await fetch(`${APP}/api/session`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Sightline-Request': '1', Origin: APP },
    body: JSON.stringify({ email, password: BENCH_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`bench sign-in failed: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0];
}

type Row = { name: string; connections: number; sightline: LoadResult; limit: LoadResult; kind: 'limit' | 'raw' };

async function main() {
  const started = Date.now();
  console.log(`Seeding ${quick ? 'a tenth of ' : ''}a firm's volume (invented bench data)…`);
  const seeded = await seedBenchData(sequelize, SCALE);
  console.log(`  ${seeded.jobs} jobs (${seeded.waiting} waiting), ${seeded.reviews} reviews, ${seeded.scores} scores in ${seeded.ms} ms`);
  const [{ technicianId }] = await sequelize.query<{ technicianId: number }>(
    "SELECT MIN(id) + 7 AS technicianId FROM users WHERE role = 'technician' AND email LIKE '%@bench.sightline.test'",
    { type: QueryTypes.SELECT },
  );
  const [{ version }] = await sequelize.query<{ version: string }>('SELECT VERSION() AS version', { type: QueryTypes.SELECT });
  await sequelize.close();

  const env = {
    PORT: String(APP_PORT),
    NODE_ENV: 'production',
    SESSION_SECRET: 'bench-only-secret',
    OUTBOX_INTERVAL_MS: '0',
    LIMIT_PORT: String(LIMIT_PORT),
  };
  const app = await start(['server/index.ts'], env, APP_PORT);
  const limit = await start(['scripts/bench/limit-server.ts'], env, LIMIT_PORT);
  try {
    const reviewer = await signIn('reviewer1@bench.sightline.test');
    const manager = await signIn('manager@bench.sightline.test');
    const today = new Date().toISOString().slice(0, 10);
    const weeksBack = (n: number) => {
      const monday = weekSpan(today, today).fromWeek;
      const span = weekSpan(new Date(Date.parse(`${monday}T00:00:00Z`) - (n - 1) * 7 * 86_400_000).toISOString().slice(0, 10), today);
      return `from=${span.from}&to=${span.to}`;
    };
    const pages = Math.max(1, Math.floor(seeded.waiting / 25));
    const deepPage = Math.min(100, pages);
    const endpoints: { name: string; path: string; limit: string; cookie: string; kind: 'limit' | 'raw' }[] = [
      { name: 'queue, page 1', path: '/api/queue?pageSize=25', limit: '/limit/queue', cookie: reviewer, kind: 'limit' },
      {
        name: 'queue, one technician',
        path: `/api/queue?pageSize=25&technicianId=${technicianId}`,
        limit: `/limit/queue?technicianId=${technicianId}`,
        cookie: reviewer,
        kind: 'limit',
      },
      {
        name: 'queue, by technician name',
        path: '/api/queue?pageSize=25&sort=technician',
        limit: '/limit/queue?sort=technician',
        cookie: reviewer,
        kind: 'limit',
      },
      {
        name: `queue, page ${deepPage}`,
        path: `/api/queue?pageSize=25&page=${deepPage}`,
        limit: `/limit/queue?page=${deepPage}`,
        cookie: reviewer,
        kind: 'limit',
      },
      { name: 'jobs, page 1 (manager)', path: '/api/jobs?pageSize=50', limit: '/limit/jobs', cookie: manager, kind: 'limit' },
      // An office types the claim number it was given: a prefix of the claim reference.
      {
        name: 'jobs, search "BNC-00421"',
        path: '/api/jobs?pageSize=50&q=BNC-00421',
        limit: '/limit/jobs?q=BNC-00421',
        cookie: manager,
        kind: 'limit',
      },
      // The worst case: one street word that one job in eight matches (12,500 jobs to sort).
      {
        name: 'jobs, search "dunmere"',
        path: '/api/jobs?pageSize=50&q=dunmere',
        limit: '/limit/jobs?q=dunmere',
        cookie: manager,
        kind: 'limit',
      },
      {
        name: 'trends, team, 12 weeks',
        path: `/api/trends/team?${weeksBack(12)}`,
        limit: `/limit/trends/team?${weeksBack(12)}`,
        cookie: manager,
        kind: 'raw',
      },
      {
        name: 'trends, technician, 52 weeks',
        path: `/api/trends?${weeksBack(52)}&technicianId=${technicianId}`,
        limit: `/limit/trends/technician?${weeksBack(52)}&technicianId=${technicianId}`,
        cookie: manager,
        kind: 'raw',
      },
    ];

    const rows: Row[] = [];
    for (const e of endpoints) {
      for (const connections of CONNECTIONS) {
        // Interleaved: Sightline, then its limit, at the same moment of the run.
        const sightline = await runLoad(`${APP}${e.path}`, { connections, durationS: DURATION_S, cookie: e.cookie });
        const bare = await runLoad(`${LIMIT}${e.limit}`, { connections, durationS: DURATION_S });
        rows.push({ name: e.name, connections, sightline, limit: bare, kind: e.kind });
        console.log(line(rows[rows.length - 1]));
      }
    }

    const firstLoad = await measureFirstLoad(APP).catch((error: Error) => ({ error: error.message }));
    const stations: StationFigures = benchStations(quick ? 2_000 : 10_000);
    const report = {
      date: new Date().toISOString(),
      quick,
      machine: {
        cpus: os.cpus().length,
        cpu: os.cpus()[0]?.model,
        memoryGB: Math.round(os.totalmem() / 2 ** 30),
        node: process.version,
        mariadb: version,
      },
      seeded,
      durationPerRunS: DURATION_S,
      rows,
      firstLoad:
        'bytes' in firstLoad ? { bytes: firstLoad.bytes, interactiveMs: firstLoad.interactiveMs, requests: firstLoad.requests } : firstLoad,
      stations,
      totalS: Math.round((Date.now() - started) / 1000),
    };
    printTable(report.rows);
    if ('bytes' in firstLoad)
      console.log(
        `\nFirst load: ${(firstLoad.bytes / 1024).toFixed(0)} KB on the wire before the sign-in form was interactive (${firstLoad.interactiveMs} ms)`,
      );
    console.log('\nStation analysis (ms, mean of runs):');
    for (const s of stations.layouts) console.log(`  ${s.layout.padEnd(28)} ${s.stations} stations  ${s.ms.toFixed(1).padStart(8)} ms`);
    console.log(
      `  naive all-pairs, jittered grid: ${stations.naiveMs.toFixed(0)} ms (${(stations.naiveMs / stations.layouts[0].ms).toFixed(0)}× slower, same answers)`,
    );
    const dir = path.join(ROOT, '.data', 'bench');
    fs.mkdirSync(dir, { recursive: true });
    const file = path.join(dir, `bench-${report.date.slice(0, 19).replace(/:/g, '')}${quick ? '-quick' : ''}.json`);
    fs.writeFileSync(file, JSON.stringify(report, null, 2));
    console.log(`\nFigures written to ${path.relative(ROOT, file)} (${report.totalS} s in all)`);
  } finally {
    app.kill();
    limit.kill();
  }
}

const ms = (v: number) => `${v.toFixed(1)}`;
function line(r: Row) {
  const ratio = r.kind === 'limit' ? r.sightline.rps / r.limit.rps : r.limit.latency.p50 / r.sightline.latency.p50;
  return `${r.name.padEnd(30)} c=${String(r.connections).padEnd(3)} ${r.sightline.rps.toFixed(0).padStart(6)} req/s p50 ${ms(r.sightline.latency.p50).padStart(7)} p95 ${ms(r.sightline.latency.p95).padStart(7)} p99 ${ms(r.sightline.latency.p99).padStart(7)} | ${r.kind === 'limit' ? 'limit' : 'raw  '} ${r.limit.rps.toFixed(0).padStart(6)} req/s p95 ${ms(r.limit.latency.p95).padStart(7)} | ${r.kind === 'limit' ? `${(ratio * 100).toFixed(0)} % of limit` : `${ratio.toFixed(1)}× faster than raw`}${r.sightline.errors ? ` (${r.sightline.errors} errors)` : ''}`;
}

function printTable(rows: Row[]) {
  console.log('\n| endpoint | conn | Sightline req/s | p50 ms | p95 ms | p99 ms | comparison req/s | comparison p95 ms | ratio |');
  console.log('|---|---|---|---|---|---|---|---|---|');
  for (const r of rows) {
    const ratio =
      r.kind === 'limit'
        ? `${((r.sightline.rps / r.limit.rps) * 100).toFixed(0)} % of limit`
        : `${(r.limit.latency.p50 / r.sightline.latency.p50).toFixed(1)}× faster than raw`;
    console.log(
      `| ${r.name} | ${r.connections} | ${r.sightline.rps.toFixed(0)} | ${ms(r.sightline.latency.p50)} | ${ms(r.sightline.latency.p95)} | ${ms(r.sightline.latency.p99)} | ${r.limit.rps.toFixed(0)} | ${ms(r.limit.latency.p95)} | ${ratio} |`,
    );
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
