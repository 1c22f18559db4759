import type { AddressInfo } from 'node:net';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import { createApp } from '../../server/app';
import { config } from '../../server/config';
import { createTransport } from '../../server/mail/transport';
import { AuditEvent, Job, OutboxMessage, Review, sequelize } from '../../server/models';
import * as outbox from '../../server/services/outbox-service';
import { sendPendingEmails } from '../../server/services/outbox-service';
import { queueOverdueReworkReminders } from '../../server/services/reminder-service';
import { submitReview } from '../../server/services/review-service';
import { claimFor, createSubmittedJob, createUser, fullScores, newJobBody, reworkRequested } from '../helpers/factories';
import { resetSignInLimits, signedInAgent, submitRecordAs } from '../helpers/http';
import { completeRecord, confirmedNow } from '../helpers/records';
import { PNG_1X1 } from '../helpers/sample-files';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

type Received = { to: string[]; subject: string; text: string };

// A real SMTP server on a loopback port, started and stopped by the test.
function smtpServer(port = 0) {
  const received: Received[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    onData(stream, session, callback) {
      simpleParser(stream).then((mail) => {
        received.push({ to: session.envelope.rcptTo.map((r) => r.address), subject: mail.subject ?? '', text: mail.text ?? '' });
        callback();
      }, callback);
    },
  });
  return new Promise<{ port: number; received: Received[]; close: () => Promise<void> }>((resolve) => {
    server.listen(port, '127.0.0.1', () =>
      resolve({
        port: (server.server.address() as AddressInfo).port,
        received,
        close: () => new Promise((done) => server.close(() => done())),
      }),
    );
  });
}

async function reworkDecision() {
  const reviewer = await createUser({ role: 'reviewer' });
  const technician = await createUser({ role: 'technician' });
  const job = await claimFor(await createSubmittedJob({ technicianId: technician.id }), reviewer.id);
  const scores = (await fullScores()).map((s) =>
    s.key === 'coverage'
      ? { ...s, score: 2, comment: 'Attic not captured: capture it from the hatch', stockReason: 'Attic not captured' }
      : s.key === 'spacing'
        ? { ...s, score: 3, comment: 'Add a doorway station between hall and kitchen' }
        : s,
  );
  const actor = { id: reviewer.id, name: reviewer.name, email: reviewer.email, role: 'reviewer' as const };
  await submitReview(actor, job.id, { decision: 'rework', scores });
  return { job, technician, reviewer };
}

describe('transactional outbox', () => {
  it('writes the rework e-mail in the same transaction as the decision', async () => {
    const { job, technician } = await reworkDecision();
    const rows = await OutboxMessage.findAll({ where: { jobId: job.id } });
    expect(rows.map((r) => [r.kind, r.recipients, r.status])).toEqual([['rework_request', [technician.email], 'pending']]);
    expect(await AuditEvent.count({ where: { jobId: job.id, type: 'email_queued' } })).toBe(1);
  });

  it('rolls the decision back when the e-mail cannot be queued', async () => {
    const reviewer = await createUser({ role: 'reviewer' });
    const job = await claimFor(await createSubmittedJob(), reviewer.id);
    const spy = jest.spyOn(outbox, 'enqueueEmail').mockRejectedValueOnce(new Error('outbox table unavailable'));
    const actor = { id: reviewer.id, name: reviewer.name, email: reviewer.email, role: 'reviewer' as const };
    await expect(submitReview(actor, job.id, { decision: 'accept', scores: await fullScores() })).rejects.toThrow(
      'outbox table unavailable',
    );
    spy.mockRestore();
    expect(await Review.count({ where: { jobId: job.id } })).toBe(0);
    expect((await Job.findByPk(job.id))!.status).toBe('in_review');
    expect(await OutboxMessage.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('keeps the e-mail while SMTP is down and delivers it exactly once when it is back', async () => {
    const { job, technician } = await reworkDecision();
    // Find a free port, then stop the server: nothing listens there now.
    const probe = await smtpServer();
    const port = probe.port;
    await probe.close();

    await sendPendingEmails(createTransport(port), 'worker-a');
    const pending = await OutboxMessage.findOne({ where: { jobId: job.id } });
    expect(pending!.status).toBe('pending');
    expect(pending!.attempts).toBe(1);
    expect(pending!.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(pending!.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());

    const smtp = await smtpServer(port);
    try {
      const later = new Date(Date.now() + 60 * 60_000);
      // Two workers at once: the lease lets only one of them send the row.
      await Promise.all([
        sendPendingEmails(createTransport(port), 'worker-a', later),
        sendPendingEmails(createTransport(port), 'worker-b', later),
      ]);
      await sendPendingEmails(createTransport(port), 'worker-a', later);
      const mine = smtp.received.filter((m) => m.subject.includes(job.claimReference));
      expect(mine).toHaveLength(1);
      expect(mine[0].to).toEqual([technician.email]);
      expect(mine[0].subject).toBe(`Rework requested: ${job.claimReference}, revision 1`);
      expect(mine[0].text).toContain('Coverage completeness (Attic not captured): Attic not captured: capture it from the hatch');
      expect(mine[0].text).toContain('Station spacing and doorway line of sight: Add a doorway station between hall and kitchen');
      const sent = await OutboxMessage.findOne({ where: { jobId: job.id } });
      expect(sent!.status).toBe('sent');
      const events = (await AuditEvent.findAll({ where: { jobId: job.id }, order: [['id', 'ASC']] })).map((e) => e.type);
      expect(events).toEqual(expect.arrayContaining(['email_queued', 'email_sent']));
      // One failed attempt that later succeeded leaves no failure on the timeline.
      expect(events).not.toContain('email_failed');
    } finally {
      await smtp.close();
    }
  });

  it('never sends a message twice when the database fails right after SMTP accepted it', async () => {
    const { job } = await reworkDecision();
    const smtp = await smtpServer();
    const later = new Date(Date.now() + 60 * 60_000);
    try {
      // The "sent" mark fails once, as it would while MariaDB restarts.
      const spy = jest
        .spyOn(OutboxMessage.prototype, 'update')
        .mockRejectedValueOnce(new Error('Connection lost: The server closed the connection.'));
      await sendPendingEmails(createTransport(smtp.port), 'worker-a', later);
      spy.mockRestore();
      expect((await OutboxMessage.findOne({ where: { jobId: job.id } }))!.status).toBe('pending');
      // The next passes apply the remembered acknowledgement and send nothing again.
      await sendPendingEmails(createTransport(smtp.port), 'worker-a', new Date(later.getTime() + 3_600_000));
      await sendPendingEmails(createTransport(smtp.port), 'worker-a', new Date(later.getTime() + 7_200_000));
      expect(smtp.received.filter((m) => m.subject.includes(job.claimReference))).toHaveLength(1);
      expect((await OutboxMessage.findOne({ where: { jobId: job.id } }))!.status).toBe('sent');
    } finally {
      await smtp.close();
    }
  });

  it('marks a message failed after the last allowed attempt, once on the timeline, and lists it for managers', async () => {
    const { job } = await reworkDecision();
    const probe = await smtpServer();
    const port = probe.port;
    await probe.close();
    const limits = config.outbox as { maxAttempts: number };
    const saved = limits.maxAttempts;
    limits.maxAttempts = 2;
    try {
      await sendPendingEmails(createTransport(port), 'worker-a', new Date(Date.now() + 3_600_000));
      await sendPendingEmails(createTransport(port), 'worker-a', new Date(Date.now() + 7_200_000));
    } finally {
      limits.maxAttempts = saved;
    }
    const message = await OutboxMessage.findOne({ where: { jobId: job.id } });
    expect(message).toMatchObject({ status: 'failed', attempts: 2 });
    expect(await AuditEvent.count({ where: { jobId: job.id, type: 'email_failed' } })).toBe(1);
    const { agent } = await signedInAgent(app, 'manager');
    const listed = await agent.get('/api/outbox/failed');
    expect(listed.body.messages.map((m: { id: number }) => m.id)).toContain(message!.id);
    expect((await agent.post(`/api/outbox/${message!.id}/retry`)).status).toBe(200);
    expect((await OutboxMessage.findByPk(message!.id))!.status).toBe('pending');
  });

  it('queues one overdue-rework reminder, never two', async () => {
    const { job } = await reworkRequested();
    await job.update({ pausedAt: new Date(Date.now() - 72 * 3_600_000) });
    await queueOverdueReworkReminders();
    await queueOverdueReworkReminders();
    const reminders = await OutboxMessage.findAll({ where: { jobId: job.id, kind: 'rework_reminder' } });
    expect(reminders).toHaveLength(1);
    expect(reminders[0].subject).toBe(`Reminder: rework overdue for ${job.claimReference}`);
  });
});

describe('answering rework and resubmitting', () => {
  it('needs every item answered, then resubmits as revision 2 with the due clock resumed', async () => {
    const signed = await signedInAgent(app, 'technician');
    const { job, item } = await reworkRequested(signed.user.id);
    await job.update({ pausedAt: new Date(Date.now() - 2 * 3_600_000) });
    const dueBefore = (await Job.findByPk(job.id))!.effectiveDueAt.getTime();

    const blocked = await submitRecordAs(signed.agent, job.id, completeRecord());
    expect(blocked.status).toBe(400);
    expect(blocked.body.error.fields.rework).toMatch(/Answer every rework item first \(1 open: Coverage completeness\)/);

    const noReason = await signed.agent.put(`/api/rework-items/${item.id}/response`).send({ response: 'cannot_fix', note: ' ' });
    expect(noReason.body.error.fields).toEqual({ note: 'Give the reason' });
    const photo = await signed.agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'attic.png');
    const foreign = await signed.agent
      .put(`/api/rework-items/${item.id}/response`)
      .send({ response: 'fixed', note: 'x', fileIds: [987654] });
    expect(foreign.body.error.fields).toEqual({ fileIds: 'A file is not attached to this job' });
    const answer = await signed.agent
      .put(`/api/rework-items/${item.id}/response`)
      .send({ response: 'fixed', note: 'Captured the attic from the hatch: 4 stations', fileIds: [photo.body.file.id] });
    expect(answer.status).toBe(200);
    expect(answer.body.item.responseFileIds).toEqual([photo.body.file.id]);

    const record = completeRecord({
      processing: confirmedNow(),
      rooms: [...completeRecord().rooms, { ...completeRecord().rooms[0], key: 'r2', name: 'Attic', level: 'attic', stations: 4 }],
      totalStations: 9,
      levels: [
        { level: 'ground', stations: 5 },
        { level: 'attic', stations: 4 },
      ],
    });
    const resubmitted = await submitRecordAs(signed.agent, job.id, record);
    expect(resubmitted.status).toBe(201);
    expect(resubmitted.body).toMatchObject({ revision: 2, status: 'resubmitted' });
    const after = (await Job.findByPk(job.id))!;
    expect(after.pausedAt).toBeNull();
    // About two hours of waiting on the technician are added to the due time.
    expect(after.effectiveDueAt.getTime() - dueBefore).toBeGreaterThanOrEqual(2 * 3_600_000 - 1000);
  });

  it('shows the reviewer what changed, the answers, and carries over untouched scores', async () => {
    const technician = await signedInAgent(app, 'technician');
    const reviewer = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob({ technicianId: technician.user.id }), reviewer.user.id);
    const scores = (await fullScores()).map((s) => (s.key === 'coverage' ? { ...s, score: 2, comment: 'Attic missing' } : s));
    expect((await reviewer.agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores })).status).toBe(201);

    const items = (await technician.agent.get(`/api/jobs/${job.id}/rework-items`)).body.items;
    await technician.agent.put(`/api/rework-items/${items[0].id}/response`).send({ response: 'fixed', note: 'Attic added' });
    const record = completeRecord({
      notes: 'Attic added',
      processing: confirmedNow(),
      rooms: [...completeRecord().rooms, { ...completeRecord().rooms[0], key: 'r2', name: 'Attic', level: 'attic', stations: 1 }],
      totalStations: 6,
      levels: [
        { level: 'ground', stations: 5 },
        { level: 'attic', stations: 1 },
      ],
    });
    expect((await submitRecordAs(technician.agent, job.id, record)).status).toBe(201);

    await reviewer.agent.post(`/api/jobs/${job.id}/claim`);
    const workspace = (await reviewer.agent.get(`/api/jobs/${job.id}/workspace`)).body;
    expect(workspace.previous.revision).toBe(1);
    expect(workspace.previous.changes.map((c: { path: string }) => c.path)).toEqual(
      expect.arrayContaining(['notes', 'totalStations', 'rooms.r2']),
    );
    expect(workspace.previous.items[0]).toMatchObject({ title: 'Coverage completeness', response: 'fixed', responseNote: 'Attic added' });
    // Rooms changed, so coverage starts empty; processing did not, so it is offered again.
    // Processing is confirmed anew for each revision, so its score is never carried over.
    expect(Object.keys(workspace.previous.carried)).toEqual(expect.arrayContaining(['supplementary']));
    expect(workspace.previous.carried).not.toHaveProperty('processing');
    expect(workspace.previous.carried).not.toHaveProperty('coverage');
  });

  it('sends a disputed item to the managers, who withdraw or uphold it', async () => {
    const signed = await signedInAgent(app, 'technician');
    const { item, job } = await reworkRequested(signed.user.id);
    await signed.agent
      .put(`/api/rework-items/${item.id}/response`)
      .send({ response: 'disputed', note: 'The attic hatch is sealed by the insured' });
    const { agent: manager } = await signedInAgent(app, 'manager');
    const disputes = (await manager.get('/api/disputes')).body.disputes;
    expect(disputes.find((d: { id: number }) => d.id === item.id)).toMatchObject({
      claimReference: job.claimReference,
      responseNote: 'The attic hatch is sealed by the insured',
    });
    const decided = await manager
      .put(`/api/rework-items/${item.id}/dispute-outcome`)
      .send({ outcome: 'withdrawn', note: 'Sealed hatch: nothing to fix' });
    expect(decided.body.item.disputeOutcome).toBe('withdrawn');
    expect((await manager.get('/api/disputes')).body.disputes.find((d: { id: number }) => d.id === item.id)).toBeUndefined();
    expect((await manager.put(`/api/rework-items/${item.id}/dispute-outcome`).send({ outcome: 'upheld', note: '' })).status).toBe(409);
  });
});

describe('GET /api/jobs/:id/timeline', () => {
  it("lists the job's events in order, for its technician but not another", async () => {
    const technician = await signedInAgent(app, 'technician');
    const { agent: manager } = await signedInAgent(app, 'manager');
    const created = await manager.post('/api/jobs').send(newJobBody(technician.user.id));
    const jobId = created.body.job.id;
    await submitRecordAs(technician.agent, jobId, completeRecord());
    const events = (await technician.agent.get(`/api/jobs/${jobId}/timeline`)).body.events;
    expect(events.map((e: { type: string }) => e.type)).toEqual(['created', 'assigned', 'submitted']);
    expect(events[2]).toMatchObject({ actor: technician.user.name, data: { revision: 1 } });
    const { agent: other } = await signedInAgent(app, 'technician');
    expect((await other.get(`/api/jobs/${jobId}/timeline`)).status).toBe(404);
  });

  it('cannot be edited: the table refuses updates and deletes', async () => {
    const { job } = await reworkRequested();
    const event = await AuditEvent.create({ jobId: job.id, actorId: null, type: 'test', data: {}, createdAt: new Date() });
    await expect(event.update({ type: 'rewritten' })).rejects.toThrow(/append-only/);
    await expect(event.destroy()).rejects.toThrow(/append-only/);
  });
});
