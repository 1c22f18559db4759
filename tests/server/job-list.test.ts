// The job list and the queue are paged, sorted and searched in SQL, and every offered order
// is read from an index (checked with EXPLAIN: no filesort, no full scan of jobs).
import crypto from 'node:crypto';

import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import { type JobPageQuery, pageSql } from '../../server/services/job-page-query';
import { JOB_JOINS as JJ, JOB_SELECT as J, jobListPageQuery } from '../../server/services/jobs-service';
import { QUEUE_JOINS as QJ, QUEUE_SELECT as Q, queuePageQuery } from '../../server/services/queue-service';
import { JOB_SORTS } from '../../shared/jobs';
import { QUEUE_SORTS } from '../../shared/review';
import { createJob, createSubmittedJob, createUser } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

// Words no other test uses, so searches see only this file's jobs.
const word = () => `Qz${crypto.randomBytes(4).toString('hex')}`;
const ids = (body: { jobs?: { id: number }[]; rows?: { id: number }[] }) => (body.jobs ?? body.rows ?? []).map((j) => j.id);

describe('GET /api/jobs paged, sorted and searched', () => {
  it('pages on the server with the total, newest due first by default', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const jobs = [];
    for (let i = 0; i < 7; i++) jobs.push(await createJob({ technicianId: user.id, dueAt: new Date(Date.now() + (i + 1) * 3_600_000) }));
    const first = await agent.get('/api/jobs?pageSize=5');
    expect(first.body).toMatchObject({ total: 7, page: 1, pageSize: 5 });
    expect(ids(first.body)).toEqual(
      jobs
        .slice(2)
        .reverse()
        .map((j) => j.id),
    );
    const second = await agent.get('/api/jobs?pageSize=5&page=2');
    expect(ids(second.body)).toEqual([jobs[1].id, jobs[0].id]);
    const ascending = await agent.get('/api/jobs?pageSize=5&sort=due&dir=asc');
    expect(ids(ascending.body)).toEqual(jobs.slice(0, 5).map((j) => j.id));
  });

  it('finds a job by claim reference prefix, address word or technician name, for a manager', async () => {
    const street = word();
    const surname = word();
    const technician = await createUser({ role: 'technician', name: `Ines ${surname}` });
    const byStreet = await createJob();
    await byStreet.update({ street: `14 ${street} Row` });
    const byTechnician = await createJob({ technicianId: technician.id });
    const { agent } = await signedInAgent(app, 'manager');

    expect(ids((await agent.get(`/api/jobs?q=${byStreet.claimReference.slice(0, 10)}`)).body)).toContain(byStreet.id);
    expect(ids((await agent.get(`/api/jobs?q=${street.slice(0, 7).toLowerCase()}`)).body)).toEqual([byStreet.id]);
    expect(ids((await agent.get(`/api/jobs?q=${encodeURIComponent(`${street} row`)}`)).body)).toEqual([byStreet.id]);
    const found = await agent.get(`/api/jobs?q=${surname}`);
    expect(ids(found.body)).toEqual([byTechnician.id]);
    expect(found.body.total).toBe(1);
    // A renamed technician is found by the new name: the copy on the job follows.
    const renamed = word();
    await technician.update({ name: `Ines ${renamed}` });
    expect(ids((await agent.get(`/api/jobs?q=${renamed}`)).body)).toEqual([byTechnician.id]);
    // LIKE's wildcards are taken literally: "%" alone matches no claim reference.
    expect((await agent.get(`/api/jobs?q=${encodeURIComponent('%')}`)).body.total).toBe(0);
  });

  it("never shows a technician another technician's job, whatever the search", async () => {
    const street = word();
    const other = await createJob();
    await other.update({ street: `2 ${street} Lane` });
    const { agent } = await signedInAgent(app, 'technician');
    const res = await agent.get(`/api/jobs?q=${street}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ jobs: [], total: 0 });
  });

  it('refuses a bad sort, page size or a search that is not text, naming the field', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    for (const [query, field] of [
      ['sort=price', 'sort'],
      ['pageSize=1000', 'pageSize'],
      ['q=a&q=b', 'q'],
      [`q=${'x'.repeat(81)}`, 'q'],
    ]) {
      const res = await agent.get(`/api/jobs?${query}`);
      expect({ query, status: res.status }).toEqual({ query, status: 400 });
      expect(res.body.error.fields).toHaveProperty(field);
    }
  });
});

describe('kept state counts', () => {
  it('equal a count of the jobs table after inserts, state changes and deletes', async () => {
    const jobs = await Promise.all([1, 2, 3].map(() => createSubmittedJob()));
    await jobs[0].update({ status: 'in_review' });
    await jobs[1].update({ status: 'accepted' });
    await jobs[2].destroy();
    const kept = await sequelize.query<{ status: string; n: number }>(
      'SELECT status, n FROM job_state_counts WHERE n <> 0 ORDER BY status',
      {
        type: QueryTypes.SELECT,
      },
    );
    const counted = await sequelize.query<{ status: string; n: number }>(
      'SELECT status, COUNT(*) AS n FROM jobs GROUP BY status ORDER BY status',
      { type: QueryTypes.SELECT },
    );
    const pairs = (rows: { status: string; n: number }[]) => rows.map((r) => `${r.status}=${Number(r.n)}`).sort();
    expect(pairs(kept)).toEqual(pairs(counted));
  });
});

describe('GET /api/queue search', () => {
  it('searches within the queue only', async () => {
    const street = word();
    const waiting = await createSubmittedJob();
    await waiting.update({ street: `9 ${street} Way` });
    const draft = await createJob();
    await draft.update({ street: `11 ${street} Way` });
    const { agent } = await signedInAgent(app, 'reviewer');
    const res = await agent.get(`/api/queue?q=${street}`);
    expect(ids(res.body)).toEqual([waiting.id]);
    expect(res.body.total).toBe(1);
  });
});

describe('index use', () => {
  // The services' own page queries, explained: each offered order must be read from an index.
  const manager = { id: 1, role: 'manager' } as Express.User;
  const technician = { id: 1, role: 'technician' } as Express.User;
  const queue = (extra: Partial<Parameters<typeof queuePageQuery>[1]> = {}) =>
    queuePageQuery(manager, { page: 1, pageSize: 25, dir: 'asc', filters: {}, ...extra }).page;
  const cases: [string, JobPageQuery, string, string][] = [
    ['queue, default', queue(), Q, QJ],
    ['queue, page 100', queue({ page: 100 }), Q, QJ],
    ['queue, one technician', queue({ filters: { technicianId: 1 } }), Q, QJ],
    ['queue, one state', queue({ filters: { status: ['resubmitted'] } }), Q, QJ],
    ...QUEUE_SORTS.flatMap((sort) => [
      [`queue, by ${sort}`, queue({ sort }), Q, QJ] as [string, JobPageQuery, string, string],
      [`queue, by ${sort} descending`, queue({ sort, dir: 'desc' }), Q, QJ] as [string, JobPageQuery, string, string],
    ]),
    ...JOB_SORTS.map((sort) => [`jobs, by ${sort}`, jobListPageQuery(manager, { sort }), J, JJ] as [string, JobPageQuery, string, string]),
    // A page past the end of this small table would be planned as a scan; the bench covers deep pages.
    ['jobs, page 2', jobListPageQuery(manager, { page: 2 }), J, JJ],
    ['jobs, one technician', jobListPageQuery(manager, { technicianId: 1 }), J, JJ],
    ['jobs, one state', jobListPageQuery(manager, { status: ['accepted'] }), J, JJ],
    ["jobs, a technician's own", jobListPageQuery(technician, {}), J, JJ],
  ];
  it.each(cases)('%s is read in index order', async (_name, query, select, joins) => {
    const { sql, params } = pageSql(query, select, joins);
    const rows = await sequelize.query<{ table: string; Extra: string | null; key: string | null }>(`EXPLAIN ${sql}`, {
      replacements: params,
      type: QueryTypes.SELECT,
    });
    // The jobs table is read along an index (a technician's own row may come first, as a
    // constant), and nothing is sorted afterwards.
    expect(rows.find((r) => r.table === 'j')?.key).toEqual(expect.any(String));
    for (const row of rows) expect(row.Extra ?? '').not.toMatch(/filesort|temporary/i);
  });
});
