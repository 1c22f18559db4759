// Defects found by an outside sweep of bad input: each case answered wrongly (a 201 or a 500)
// before the fix.
import request from 'supertest';

import { createApp } from '../../server/app';
import { Job, SecondReview, sequelize, StoredFile, User } from '../../server/models';
import { submitReview } from '../../server/services/review-service';
import {
  claimFor,
  createReview,
  createSubmittedJob,
  createUser,
  fullScores,
  newJobBody,
  reworkRequested,
  secondReviewByAnother,
} from '../helpers/factories';
import { clientAgent, countRows, resetSignInLimits, signedInAgent, technicianWithJob } from '../helpers/http';
import { completeRecord } from '../helpers/records';
import { PDF_MINIMAL, PNG_1X1 } from '../helpers/sample-files';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const zeroScores = async () =>
  (await fullScores()).map((s) => ({ ...s, score: s.score === null ? null : 0, comment: s.score === null ? '' : 'Not there' }));

describe('a list or object where a single value belongs', () => {
  it('refuses a decision sent as ["accept"] and records nothing', async () => {
    const { agent, user } = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob(), user.id);
    const before = await countRows('reviews');
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: ['accept'], scores: await zeroScores() });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.decision).toBe('Must be a single value, not a list');
    expect(await countRows('reviews')).toBe(before);
    expect((await Job.findByPk(job.id))!.status).toBe('in_review');
  });

  it.each([
    ['units', []],
    ['cameraClass', ['tripod_depth']],
  ])('refuses %s as a list in an autosave', async (field, value) => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send({ ...completeRecord(), [field]: value });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
  });

  it('refuses a role given as ["admin"]', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const target = await createUser();
    const res = await agent.patch(`/api/users/${target.id}`).send({ role: ['admin'] });
    expect(res.status).toBe(400);
    expect((await User.findByPk(target.id))!.role).toBe('technician');
  });

  it.each([
    ['technicianId', [1]],
    ['priority', []],
    ['dueAt', []],
  ])('answers 400, not 500, for %s as a list on a job edit', async (field, value) => {
    const { agent } = await signedInAgent(app, 'manager');
    const job = (await createSubmittedJob()) as Job;
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ [field]: value });
    expect(res.status).toBe(400);
  });

  it('refuses a query parameter given twice', async () => {
    const { agent } = await signedInAgent(app, 'reviewer');
    for (const query of ['page=1&page=2', 'pageSize=10&pageSize=20', 'technicianId=1&technicianId=2']) {
      const res = await agent.get(`/api/queue?${query}`);
      expect(res.status).toBe(400);
    }
  });
});

describe('POST /api/jobs keeps to the fields it takes', () => {
  it('ignores status, revision, paused time and id sent in the body', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const res = await agent
      .post('/api/jobs')
      .send({ ...newJobBody(technician.id), status: 'accepted', currentRevision: 7, pausedMs: 99, id: 1 });
    expect(res.status).toBe(201);
    const job = await Job.findByPk(res.body.job.id);
    expect(job).toMatchObject({ status: 'draft', currentRevision: 0, pausedMs: 0 });
    expect(job!.id).not.toBe(1);
  });

  it('answers 201 or 409, never 500, to ten creates racing for one claim reference', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const body = newJobBody(technician.id);
    const statuses = await Promise.all(
      Array.from({ length: 10 }, () =>
        agent
          .post('/api/jobs')
          .send(body)
          .then((r) => r.status),
      ),
    );
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(9);
  });
});

describe('requests the server cannot read', () => {
  it('refuses Origin: null and an unparsable Origin with 403', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    for (const origin of ['null', 'http://[bad']) {
      const res = await agent.post('/api/jobs').set('Origin', origin).send({});
      expect(res.status).toBe(403);
    }
  });

  it('refuses a body in another charset or an unknown Content-Encoding with 415', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const latin = await agent.post('/api/jobs').set('Content-Type', 'application/json; charset=latin1').send('{}');
    expect(latin.status).toBe(415);
    const encoded = await agent.post('/api/jobs').set('Content-Type', 'application/json').set('Content-Encoding', 'zstd-ish').send('{}');
    expect(encoded.status).toBe(415);
  });

  it('refuses JSON nested past what any form sends', async () => {
    const { agent, job } = await technicianWithJob(app);
    let deep: unknown = 'x';
    for (let i = 0; i < 40; i++) deep = { deep };
    const res = await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send({ ...completeRecord(), notes: deep });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('too_deep');
  });

  it('answers a 300-character sign-in e-mail with 400 (or 401), never 500', async () => {
    const res = await clientAgent(app)
      .post('/api/session')
      .send({ email: `${'a'.repeat(300)}@example.test`, password: 'whatever-it-is' });
    expect([400, 401]).toContain(res.status);
    await resetSignInLimits();
  });

  it('refuses two files, or a file under another field name, with 400', async () => {
    const { agent, job } = await technicianWithJob(app);
    const two = await agent
      .post(`/api/jobs/${job.id}/files`)
      .field('kind', 'photo')
      .attach('file', PNG_1X1, 'a.png')
      .attach('file', PNG_1X1, 'b.png');
    expect(two.status).toBe(400);
    const wrong = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('picture', PNG_1X1, 'a.png');
    expect(wrong.status).toBe(400);
  });
});

describe('files', () => {
  it('keeps a non-ASCII file name intact', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'Küche–Süd.png');
    expect(res.status).toBe(201);
    expect(res.body.file.name).toBe('Küche–Süd.png');
    const download = await agent.get(`/api/files/${res.body.file.id}`);
    expect(download.headers['content-disposition']).toContain("filename*=UTF-8''K%C3%BCche%E2%80%93S%C3%BCd.png");
  });

  it('serves a PDF as a download, not inline', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'sketch').attach('file', PDF_MINIMAL, 'plan.pdf');
    const download = await agent.get(`/api/files/${res.body.file.id}`);
    expect(download.headers['content-disposition']).toMatch(/^attachment;/);
  });

  it('refuses uploads to and removals from an accepted job', async () => {
    const { agent, job, user } = await technicianWithJob(app);
    const kept = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'kept.png');
    await Job.update({ status: 'accepted' }, { where: { id: job.id } });
    const upload = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'late.png');
    expect(upload.status).toBe(409);
    const detach = await agent.delete(`/api/jobs/${job.id}/files/${kept.body.file.id}`);
    expect(detach.status).toBe(409);
    expect(await StoredFile.count({ where: { jobId: job.id, detachedAt: null, uploadedById: user.id } })).toBe(1);
  });
});

describe('trends CSV', () => {
  it('writes a cell that starts like a formula as text', async () => {
    const technician = await createUser({ role: 'technician', name: '=HYPERLINK("x")' });
    const reviewer = await createUser({ role: 'reviewer' });
    await createReview(await createSubmittedJob({ technicianId: technician.id }), reviewer.id, 'accept');
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.get(`/api/trends/team?format=csv&technicianId=${technician.id}`);
    expect(res.status).toBe(200);
    expect(res.text).toContain('HYPERLINK');
    expect(res.text).not.toMatch(/(^|,|\n)"?=HYPERLINK/);
  });
});

describe('timeline privacy', () => {
  it('never shows a technician whom an e-mail went to', async () => {
    const { job } = await reworkRequested();
    const owner = await User.findByPk(job.technicianId);
    const agent = clientAgent(app);
    const { TEST_PASSWORD } = await import('../helpers/factories');
    await agent.post('/api/session').send({ email: owner!.email, password: TEST_PASSWORD });
    const { agent: reviewer, user } = await signedInAgent(app, 'reviewer');
    const next = await claimFor(await createSubmittedJob({ technicianId: owner!.id }), user.id);
    await reviewer.post(`/api/jobs/${next.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    const events = (await agent.get(`/api/jobs/${next.id}/timeline`)).body.events as { type: string; data: Record<string, unknown> }[];
    const queued = events.filter((e) => e.type === 'email_queued');
    expect(queued.length).toBeGreaterThan(0);
    for (const e of queued) expect(e.data.to).toBeUndefined();
  });
});

describe('blind second reviews stay blind', () => {
  async function openSecondReview() {
    const first = await createUser({ role: 'reviewer' });
    const job = await claimFor(await createSubmittedJob(), first.id);
    const actor = { id: first.id, name: first.name, email: first.email, role: 'reviewer' as const };
    const scores = (await fullScores()).map((s, i) => (i === 0 && s.score !== null ? { ...s, score: 1, comment: 'Attic missing' } : s));
    await submitReview(actor, job.id, { decision: 'rework', scores }, () => 0);
    return { job, first };
  }

  it('draws rework decisions too, not only acceptances', async () => {
    const { job } = await openSecondReview();
    expect(await SecondReview.count({ where: { jobId: job.id, secondReviewId: null } })).toBe(1);
  });

  it('hides the first score, decision and reviewer from other reviewers in the timeline', async () => {
    const { job, first } = await openSecondReview();
    const { agent } = await signedInAgent(app, 'reviewer');
    const events = (await agent.get(`/api/jobs/${job.id}/timeline`)).body.events as {
      type: string;
      data: Record<string, unknown>;
      actor: string | null;
    }[];
    const reviewed = events.find((e) => e.type === 'reviewed')!;
    expect(reviewed.data).toEqual({ revision: 1, rubricVersion: expect.any(Number), hidden: true });
    expect(reviewed.actor).toBeNull();
    expect(JSON.stringify(events)).not.toContain(first.name);
    expect(JSON.stringify(events)).not.toContain('rework_request');
    // The first reviewer and managers still see it.
    const { agent: manager } = await signedInAgent(app, 'manager');
    const full = (await manager.get(`/api/jobs/${job.id}/timeline`)).body.events as { type: string; data: Record<string, unknown> }[];
    expect(full.find((e) => e.type === 'reviewed')!.data.decision).toBe('rework');
  });

  it('hides the first review from the next revision’s workspace while the blind review is open', async () => {
    const { job } = await openSecondReview();
    // The technician resubmits revision 2; another reviewer opens it.
    const { createRevision } = await import('../helpers/factories');
    await createRevision(job, 2, completeRecord({ notes: 'attic added' }));
    await job.update({ status: 'resubmitted', currentRevision: 2 });
    const { agent, user } = await signedInAgent(app, 'reviewer');
    await claimFor(job, user.id);
    const workspace = (await agent.get(`/api/jobs/${job.id}/workspace`)).body;
    expect(workspace.previous).toMatchObject({ revision: 1, score: null, decision: null, items: [], carried: {}, hidden: true });
  });

  it('refuses to accept a failing score in a blind second review', async () => {
    const second = await secondReviewByAnother();
    const { agent } = await signedInAgent(app, 'reviewer');
    await agent.post(`/api/second-reviews/${second.id}/claim`);
    const res = await agent.post(`/api/second-reviews/${second.id}/reviews`).send({ decision: 'accept', scores: await zeroScores() });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.decision).toMatch(/failing review cannot be accepted/);
  });
});

describe('sessions', () => {
  it('ends a session a fixed time after sign-in, however active', async () => {
    const { agent } = await signedInAgent(app, 'technician');
    expect((await agent.get('/api/me')).status).toBe(200);
    const realNow = Date.now;
    try {
      Date.now = () => realNow() + 25 * 3_600_000;
      expect((await agent.get('/api/me')).status).toBe(401);
    } finally {
      Date.now = realNow;
    }
  });

  it('refuses a same-host Origin with the wrong scheme', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.post('/api/jobs').set('Host', 'sightline.example').set('Origin', 'https://sightline.example').send({});
    expect(res.status).toBe(403);
    expect((await request(app).get('/api/health')).status).toBe(200);
  });
});
