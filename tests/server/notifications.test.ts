// In-app notifications end to end through the API: raised by the same events that write the
// timeline, listed and marked by their owner alone, and e-mailed per each person's choice.
import { createApp } from '../../server/app';
import { Notification, OutboxMessage, sequelize } from '../../server/models';
import { queueOverdueReworkReminders } from '../../server/services/reminder-service';
import { claimFor, createSubmittedJob, createUser, fullScores, newJobBody, reworkRequested } from '../helpers/factories';
import { resetSignInLimits, signedInAgent, submitRecordAs } from '../helpers/http';
import { completeRecord, confirmedNow } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

type List = { unread: number; items: { id: number; kind: string; text: string; jobId: number | null; read: boolean }[] };

describe('notifications', () => {
  it("puts a new job in its technician's list, unread, linked to the job", async () => {
    const technician = await signedInAgent(app, 'technician');
    const manager = await signedInAgent(app, 'manager');
    const created = await manager.agent.post('/api/jobs').send(newJobBody(technician.user.id));
    expect(created.status).toBe(201);
    const list = (await technician.agent.get('/api/notifications')).body as List;
    expect(list.unread).toBe(1);
    expect(list.items[0]).toMatchObject({ kind: 'job_assigned', jobId: created.body.job.id, read: false });
    expect(list.items[0].text).toContain(created.body.job.claimReference);
    // The manager who made the change is not told about it.
    expect(((await manager.agent.get('/api/notifications')).body as List).items.some((i) => i.jobId === created.body.job.id)).toBe(false);
  });

  it('tells every active reviewer when a record is resubmitted', async () => {
    const technician = await signedInAgent(app, 'technician');
    const reviewer = await signedInAgent(app, 'reviewer');
    const { job, item } = await reworkRequested(technician.user.id);
    await technician.agent.put(`/api/rework-items/${item.id}/response`).send({ response: 'fixed', note: 'Attic captured from the hatch' });
    const res = await submitRecordAs(technician.agent, job.id, completeRecord({ processing: confirmedNow() }));
    expect(res.status).toBe(201);
    const list = (await reviewer.agent.get('/api/notifications')).body as List;
    expect(list.items.find((i) => i.jobId === job.id)).toMatchObject({
      kind: 'record_submitted',
      text: `Resubmitted for review: ${job.claimReference}, revision 2`,
    });
  });

  it('tells the technician of a rework request, and the receiving reviewer of a moved claim', async () => {
    const technician = await createUser({ role: 'technician' });
    const reviewer = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob({ technicianId: technician.id }), reviewer.user.id);
    const scores = (await fullScores()).map((s) => (s.key === 'spacing' ? { ...s, score: 2, comment: 'Hall sparse' } : s));
    expect((await reviewer.agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores })).status).toBe(201);
    expect(await Notification.findOne({ where: { userId: technician.id, jobId: job.id } })).toMatchObject({ kind: 'rework_requested' });

    const from = await createUser({ role: 'reviewer' });
    const to = await signedInAgent(app, 'reviewer');
    const other = await claimFor(await createSubmittedJob(), from.id);
    const manager = await signedInAgent(app, 'manager');
    expect((await manager.agent.post('/api/claims/reassign').send({ toReviewerId: to.user.id, jobIds: [other.id] })).status).toBe(200);
    const list = (await to.agent.get('/api/notifications')).body as List;
    expect(list.items.find((i) => i.jobId === other.id)).toMatchObject({ kind: 'claim_moved' });

    // Several claims moved at once: one notice, naming them.
    const many = [await claimFor(await createSubmittedJob(), from.id), await claimFor(await createSubmittedJob(), from.id)];
    const target = await signedInAgent(app, 'reviewer');
    await manager.agent
      .post('/api/claims/reassign')
      .send({ toReviewerId: target.user.id, jobIds: many.map((j) => j.id) })
      .expect(200);
    const told = ((await target.agent.get('/api/notifications')).body as List).items;
    expect(told.map((i) => i.text)).toEqual([`2 claims were moved to you: ${many.map((j) => j.claimReference).join(', ')}`]);
  });

  it('marks one read, then all, and lets nobody mark or see anyone else’s', async () => {
    const me = await signedInAgent(app, 'technician');
    const stranger = await signedInAgent(app, 'technician');
    const rows = await Notification.bulkCreate(
      [1, 2, 3].map((n) => ({
        userId: me.user.id,
        jobId: null,
        kind: 'job_assigned' as const,
        text: `Notice ${n}`,
        createdAt: new Date(),
        readAt: null,
      })),
    );
    expect((await stranger.agent.post(`/api/notifications/${rows[0].id}/read`)).status).toBe(404);
    expect(((await stranger.agent.get('/api/notifications')).body as List).items).toEqual([]);
    expect((await me.agent.post(`/api/notifications/${rows[0].id}/read`)).status).toBe(204);
    expect(((await me.agent.get('/api/notifications')).body as List).unread).toBe(2);
    expect((await me.agent.post('/api/notifications/read-all')).status).toBe(204);
    const list = (await me.agent.get('/api/notifications')).body as List;
    expect(list.unread).toBe(0);
    expect(list.items.every((i) => i.read)).toBe(true);
  });
});

describe('e-mail choices per kind', () => {
  it("lists only a role's own kinds, with today's e-mails on by default", async () => {
    const technician = await signedInAgent(app, 'technician');
    const res = await technician.agent.get('/api/notifications/prefs');
    expect(res.body.prefs.map((p: { kind: string; email: boolean }) => [p.kind, p.email])).toEqual([
      ['job_assigned', false],
      ['rework_requested', true],
      ['rework_reminder', true],
      ['decision', true],
    ]);
  });

  it('stops the rework e-mail when the technician turns it off, but still tells them in the app', async () => {
    const technician = await signedInAgent(app, 'technician');
    await technician.agent.put('/api/notifications/prefs/rework_requested').send({ email: false }).expect(200);
    const reviewer = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob({ technicianId: technician.user.id }), reviewer.user.id);
    const scores = (await fullScores()).map((s) => (s.key === 'spacing' ? { ...s, score: 2, comment: 'Hall sparse' } : s));
    const res = await reviewer.agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores });
    expect(res.body.emailQueued).toBe(false);
    expect(await OutboxMessage.count({ where: { jobId: job.id, kind: 'rework_request' } })).toBe(0);
    expect(await Notification.count({ where: { userId: technician.user.id, jobId: job.id, kind: 'rework_requested' } })).toBe(1);
  });

  it('e-mails a kind that has no e-mail of its own once someone turns it on', async () => {
    const technician = await signedInAgent(app, 'technician');
    await technician.agent.put('/api/notifications/prefs/job_assigned').send({ email: true }).expect(200);
    const manager = await signedInAgent(app, 'manager');
    const created = await manager.agent.post('/api/jobs').send(newJobBody(technician.user.id));
    const mail = await OutboxMessage.findOne({ where: { jobId: created.body.job.id, kind: 'notice_job_assigned' } });
    expect(mail!.recipients).toEqual([technician.user.email]);
    expect(mail!.textBody).toContain(`/jobs/${created.body.job.id}`);
  });

  it('reminds once per rework request in the app even with reminder e-mails off', async () => {
    const technician = await signedInAgent(app, 'technician');
    await technician.agent.put('/api/notifications/prefs/rework_reminder').send({ email: false }).expect(200);
    const { job } = await reworkRequested(technician.user.id);
    await job.update({ pausedAt: new Date(Date.now() - 1000 * 3_600_000) });
    await queueOverdueReworkReminders();
    await queueOverdueReworkReminders();
    expect(await Notification.count({ where: { jobId: job.id, kind: 'rework_reminder' } })).toBe(1);
    expect(await OutboxMessage.count({ where: { jobId: job.id, kind: 'rework_reminder' } })).toBe(0);
  });
});
