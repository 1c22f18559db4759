import { createApp } from '../../server/app';
import { config } from '../../server/config';
import { AuditEvent, CaptureDraft, Job, Notification, sequelize } from '../../server/models';
import { createJob, createUser, newJobBody, reworkRequested } from '../helpers/factories';
import { countRows, resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('GET /api/jobs', () => {
  it('shows a technician only their own jobs, newest due first', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const soon = await createJob({ technicianId: user.id, dueAt: new Date(Date.now() + 86_400_000) });
    const later = await createJob({ technicianId: user.id, dueAt: new Date(Date.now() + 5 * 86_400_000) });
    const someoneElses = await createJob();
    const res = await agent.get('/api/jobs');
    expect(res.status).toBe(200);
    const ids = res.body.jobs.map((j: { id: number }) => j.id);
    expect(ids).toEqual([later.id, soon.id]);
    expect(ids).not.toContain(someoneElses.id);
  });

  it('filters by status', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    await createJob({ technicianId: user.id, status: 'draft' });
    const rework = await createJob({ technicianId: user.id, status: 'rework_requested' });
    const res = await agent.get('/api/jobs?status=rework_requested');
    expect(res.body.jobs.map((j: { id: number }) => j.id)).toEqual([rework.id]);
  });

  it('refuses an unknown status filter by name', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.get('/api/jobs?status=lost');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('status');
  });

  it("shows a manager every technician's jobs", async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const a = await createJob();
    const b = await createJob();
    const res = await agent.get(`/api/jobs?technicianId=${a.technicianId}`);
    expect(res.body.jobs.map((j: { id: number }) => j.id)).toEqual([a.id]);
    // Every job is in the list: found by claim reference among all technicians' jobs.
    for (const job of [a, b]) {
      const found = await agent.get(`/api/jobs?q=${job.claimReference}`);
      expect(found.body.jobs.map((j: { id: number }) => j.id)).toEqual([job.id]);
    }
  });
});

describe('POST /api/jobs/reassign', () => {
  it('moves three jobs to one technician in one go: an event per job and one notice for the technician', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const to = await createUser({ role: 'technician' });
    const jobs = [await createJob(), await createJob(), await createJob()];
    const res = await agent.post('/api/jobs/reassign').send({ jobIds: jobs.map((j) => j.id), technicianId: to.id });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ moved: 3 });
    for (const job of jobs) expect((await Job.findByPk(job.id))!.technicianId).toBe(to.id);
    expect(await AuditEvent.count({ where: { jobId: jobs.map((j) => j.id), type: 'reassigned' } })).toBe(3);
    const notices = await Notification.findAll({ where: { userId: to.id } });
    expect(notices.map((n) => n.text)).toEqual([`3 jobs are now assigned to you: ${jobs.map((j) => j.claimReference).join(', ')}`]);
  });

  it('moves none when one cannot move, and says which', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const to = await createUser({ role: 'technician' });
    const jobs = [await createJob(), await createJob(), await createJob({ status: 'accepted' })];
    const before = await Promise.all(jobs.map(async (j) => (await Job.findByPk(j.id))!.technicianId));
    const res = await agent.post('/api/jobs/reassign').send({ jobIds: jobs.map((j) => j.id), technicianId: to.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.jobIds).toBe(`Accepted jobs cannot move: ${jobs[2].claimReference}. Nothing was moved.`);
    expect(await Promise.all(jobs.map(async (j) => (await Job.findByPk(j.id))!.technicianId))).toEqual(before);
    expect(await AuditEvent.count({ where: { jobId: jobs.map((j) => j.id), type: 'reassigned' } })).toBe(0);
    expect(await Notification.count({ where: { userId: to.id } })).toBe(0);
  });
});

describe('the rework deadline', () => {
  it('is on the job page and in My jobs while rework is asked for, and nowhere else', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const { job } = await reworkRequested(user.id);
    const other = await createJob({ technicianId: user.id });
    const requestedAt = (await Job.findByPk(job.id))!.pausedAt!;
    const expected = new Date(requestedAt.getTime() + config.reworkHours * 3_600_000).toISOString();
    const detail = await agent.get(`/api/jobs/${job.id}`);
    expect(detail.body.job.reworkDueAt).toBe(expected);
    const list = await agent.get('/api/jobs');
    const rows = new Map(list.body.jobs.map((r: { id: number; reworkDueAt: string | null }) => [r.id, r.reworkDueAt]));
    expect(rows.get(job.id)).toBe(expected);
    expect(rows.get(other.id)).toBeNull();
  });
});

describe('GET /api/jobs/:id', () => {
  it("answers 404 to a technician for another technician's job", async () => {
    const { agent } = await signedInAgent(app, 'technician');
    const job = await createJob();
    expect((await agent.get(`/api/jobs/${job.id}`)).status).toBe(404);
  });

  it('gives the assigned technician the job, its empty record and no revisions yet', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const job = await createJob({ technicianId: user.id });
    const res = await agent.get(`/api/jobs/${job.id}`);
    expect(res.status).toBe(200);
    expect(res.body.job).toMatchObject({ id: job.id, status: 'draft', technician: { id: user.id } });
    expect(res.body.record.rooms).toEqual([]);
    expect(res.body.revisions).toEqual([]);
  });
});

describe('POST /api/jobs', () => {
  it('creates a job in draft with an empty capture record', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const body = newJobBody(technician.id);
    const res = await agent.post('/api/jobs').send(body);
    expect(res.status).toBe(201);
    expect(res.body.job).toMatchObject({ claimReference: body.claimReference, status: 'draft', technician: { id: technician.id } });
    expect(await CaptureDraft.findByPk(res.body.job.id)).not.toBeNull();
  });

  it('refuses a duplicate claim reference and writes nothing', async () => {
    const { agent } = await signedInAgent(app, 'admin');
    const technician = await createUser({ role: 'technician' });
    const body = newJobBody(technician.id);
    await agent.post('/api/jobs').send(body);
    const before = await countRows('jobs');
    const res = await agent.post('/api/jobs').send(body);
    expect(res.status).toBe(409);
    expect(res.body.error.fields).toEqual({ claimReference: 'Already in use' });
    expect(await countRows('jobs')).toBe(before);
  });

  it('refuses to assign a job to someone who is not an active technician', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const reviewer = await createUser({ role: 'reviewer' });
    const gone = await createUser({ role: 'technician', active: false });
    for (const id of [reviewer.id, gone.id]) {
      const res = await agent.post('/api/jobs').send(newJobBody(id));
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual({ technicianId: 'Choose an active technician' });
    }
  });

  it('refuses a site visit before the loss', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const res = await agent.post('/api/jobs').send({ ...newJobBody(technician.id), lossDate: '2026-11-20', siteVisitDate: '2026-11-19' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['siteVisitDate']);
  });
});

describe('PATCH /api/jobs/:id', () => {
  it('reassigns a job to another technician', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const job = await createJob();
    const other = await createUser({ role: 'technician' });
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ technicianId: other.id, priority: 'catastrophe' });
    expect(res.status).toBe(200);
    const reloaded = await Job.findByPk(job.id);
    expect(reloaded!.technicianId).toBe(other.id);
    expect(reloaded!.priority).toBe('catastrophe');
  });

  // Each field alone: the others keep their values.
  const cases: [string, () => Promise<string | number>][] = [
    ['technicianId', async () => (await createUser({ role: 'technician' })).id],
    ['priority', async () => 'urgent'],
    ['dueAt', async () => new Date(Date.now() + 9 * 86_400_000).toISOString()],
    ['siteVisitDate', async () => '2026-11-30'],
  ];
  it.each(cases)('changes only %s when only %s is sent', async (field, value) => {
    const { agent } = await signedInAgent(app, 'manager');
    const job = await createJob();
    const before = (await Job.findByPk(job.id))!.toJSON() as Record<string, unknown>;
    const sent = await value();
    const res = await agent.patch(`/api/jobs/${job.id}`).send({ [field]: sent });
    expect(res.status).toBe(200);
    const after = (await Job.findByPk(job.id))!.toJSON() as Record<string, unknown>;
    for (const other of ['technicianId', 'priority', 'dueAt', 'siteVisitDate'].filter((f) => f !== field)) {
      expect(after[other]).toEqual(before[other]);
    }
    expect(field === 'dueAt' ? (after.dueAt as Date).toISOString() : after[field]).toEqual(sent);
  });
});

describe('GET /api/technicians', () => {
  it('lists active technicians only', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const gone = await createUser({ role: 'technician', active: false });
    const res = await agent.get('/api/technicians');
    const ids = res.body.technicians.map((t: { id: number }) => t.id);
    expect(ids).not.toContain(gone.id);
    expect(res.body.technicians.length).toBeGreaterThan(0);
  });
});
