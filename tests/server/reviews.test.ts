import { createApp } from '../../server/app';
import { AuditEvent, Job, OutboxMessage, Review, ReviewScore, ReworkItem, Rubric, SecondReview, sequelize } from '../../server/models';
import { submitReview } from '../../server/services/review-service';
import { DEFAULT_RUBRIC } from '../../shared/default-rubric';
import { claimFor, createSubmittedJob, createUser, fullScores, secondReviewByAnother } from '../helpers/factories';
import { countRows, resetSignInLimits, signedInAgent } from '../helpers/http';
import { completeRecord } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('POST /api/jobs/:id/claim', () => {
  it('lets exactly one of 20 simultaneous claims win; the others get 409 naming the winner', async () => {
    const job = await createSubmittedJob();
    const reviewers = await Promise.all(Array.from({ length: 20 }, () => signedInAgent(app, 'reviewer')));
    const results = await Promise.all(reviewers.map(({ agent }) => agent.post(`/api/jobs/${job.id}/claim`)));
    const wins = results.filter((r) => r.status === 200);
    expect(wins).toHaveLength(1);
    const losers = results.filter((r) => r.status === 409);
    expect(losers).toHaveLength(19);
    expect(losers[0].body.error.message).toBe(`${wins[0].body.claimedBy.name} has claimed this job.`);
    expect((await Job.findByPk(job.id))!.status).toBe('in_review');
  });

  it('lets another reviewer take over a claim that has expired', async () => {
    const first = await createUser({ role: 'reviewer' });
    const job = await claimFor(await createSubmittedJob(), first.id, -1);
    const { agent, user } = await signedInAgent(app, 'reviewer');
    const res = await agent.post(`/api/jobs/${job.id}/claim`);
    expect(res.status).toBe(200);
    expect((await Job.findByPk(job.id))!.claimedById).toBe(user.id);
  });

  it('refuses a job that is not waiting for review', async () => {
    const job = await createSubmittedJob();
    await job.update({ status: 'accepted' });
    const { agent } = await signedInAgent(app, 'reviewer');
    expect((await agent.post(`/api/jobs/${job.id}/claim`)).status).toBe(409);
  });
});

describe('POST /api/queue/claim-next', () => {
  // Each case filters on a fresh technician, so other tests' jobs are not in its queue.
  const hourAgo = (h: number) => new Date(Date.now() - h * 3_600_000);

  it('claims the next free record in the filter and sort, skipping one another reviewer holds', async () => {
    const technician = await createUser({ role: 'technician' });
    const other = await createUser({ role: 'reviewer' });
    const held = await claimFor(await createSubmittedJob({ technicianId: technician.id, dueAt: hourAgo(3) }), other.id);
    const next = await createSubmittedJob({ technicianId: technician.id, dueAt: hourAgo(2) });
    await createSubmittedJob({ technicianId: technician.id, dueAt: hourAgo(1) });
    const { agent, user } = await signedInAgent(app, 'reviewer');
    const res = await agent.post(`/api/queue/claim-next?technicianId=${technician.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ found: true, jobId: next.id, claimedBy: { id: user.id } });
    expect((await Job.findByPk(next.id))!.claimedById).toBe(user.id);
    expect((await Job.findByPk(held.id))!.claimedById).toBe(other.id);
  });

  it('follows the sort it is given', async () => {
    const technician = await createUser({ role: 'technician' });
    await createSubmittedJob({ technicianId: technician.id, dueAt: hourAgo(2) });
    const later = await createSubmittedJob({ technicianId: technician.id, dueAt: hourAgo(1) });
    const { agent } = await signedInAgent(app, 'reviewer');
    const res = await agent.post(`/api/queue/claim-next?technicianId=${technician.id}&sort=due&dir=desc`);
    expect(res.body.jobId).toBe(later.id);
  });

  it('gives two reviewers pressing it at once two different records', async () => {
    const technician = await createUser({ role: 'technician' });
    const jobs = [await createSubmittedJob({ technicianId: technician.id }), await createSubmittedJob({ technicianId: technician.id })];
    const [a, b] = [await signedInAgent(app, 'reviewer'), await signedInAgent(app, 'reviewer')];
    const results = await Promise.all([a, b].map(({ agent }) => agent.post(`/api/queue/claim-next?technicianId=${technician.id}`)));
    expect(results.map((r) => r.body.jobId).sort()).toEqual(jobs.map((j) => j.id).sort());
  });

  it('says so when nothing in the filter is free', async () => {
    const technician = await createUser({ role: 'technician' });
    const other = await createUser({ role: 'reviewer' });
    await claimFor(await createSubmittedJob({ technicianId: technician.id }), other.id);
    const { agent } = await signedInAgent(app, 'reviewer');
    const res = await agent.post(`/api/queue/claim-next?technicianId=${technician.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ found: false, jobId: null });
  });

  it('refuses a malformed filter by name', async () => {
    const { agent } = await signedInAgent(app, 'reviewer');
    const res = await agent.post('/api/queue/claim-next?sort=nonsense&technicianId=1&technicianId=2');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['sort', 'technicianId']));
  });
});

describe('DELETE /api/jobs/:id/claim', () => {
  it('releases the claim and puts the job back in the queue', async () => {
    const { agent, user } = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob(), user.id);
    expect((await agent.delete(`/api/jobs/${job.id}/claim`)).status).toBe(204);
    const reloaded = await Job.findByPk(job.id);
    expect(reloaded).toMatchObject({ claimedById: null, status: 'submitted' });
    const events = await AuditEvent.findAll({ where: { jobId: job.id } });
    expect(events.map((e) => e.type)).toEqual(['released']);
  });
});

describe('POST /api/claims/reassign', () => {
  it('moves every live claim of an absent reviewer to another', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const absent = await createUser({ role: 'reviewer' });
    const cover = await createUser({ role: 'reviewer' });
    const a = await claimFor(await createSubmittedJob(), absent.id);
    const b = await claimFor(await createSubmittedJob(), absent.id);
    const res = await agent.post('/api/claims/reassign').send({ fromReviewerId: absent.id, toReviewerId: cover.id });
    expect(res.status).toBe(200);
    expect(res.body.moved).toBe(2);
    for (const job of [a, b]) expect((await Job.findByPk(job.id))!.claimedById).toBe(cover.id);
  });

  it('refuses a target who is not a reviewer', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const res = await agent.post('/api/claims/reassign').send({ fromReviewerId: 1, toReviewerId: technician.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ toReviewerId: 'Choose an active reviewer' });
  });
});

describe('POST /api/jobs/:id/reviews', () => {
  async function claimedJob() {
    const signed = await signedInAgent(app, 'reviewer');
    const job = await claimFor(await createSubmittedJob(), signed.user.id);
    return { ...signed, job };
  }

  it('accepts with full marks: saves the review, the scores, the job state and a timeline event', async () => {
    const { agent, job } = await claimedJob();
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ score: 100, passed: true, decision: 'accept' });
    const reloaded = await Job.findByPk(job.id);
    expect(reloaded).toMatchObject({ status: 'accepted', claimedById: null });
    const review = await Review.findOne({ where: { jobId: job.id } });
    expect(await ReviewScore.count({ where: { reviewId: review!.id } })).toBe(DEFAULT_RUBRIC.criteria.length);
    const event = await AuditEvent.findOne({ where: { jobId: job.id, type: 'reviewed' } });
    expect(event!.data).toMatchObject({ decision: 'accept', score: 100, revision: 1 });
  });

  it("keeps the reviewer's overall note on the review, in the timeline and in the technician's e-mail", async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).map((s) => (s.key === 'spacing' ? { ...s, score: 2, comment: 'Hall sparse' } : s));
    const note = 'Good capture overall; only the hall needs two more stations.';
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores, note: `  ${note} ` });
    expect(res.status).toBe(201);
    expect((await Review.findOne({ where: { jobId: job.id } }))!.note).toBe(note);
    const event = await AuditEvent.findOne({ where: { jobId: job.id, type: 'reviewed' } });
    expect(event!.data).toMatchObject({ note });
    const email = await OutboxMessage.findOne({ where: { jobId: job.id, kind: 'rework_request' } });
    expect(email!.textBody).toContain(`Note from the reviewer: ${note}`);
  });

  it('refuses a note that is not text, by name, and writes nothing', async () => {
    const { agent, job } = await claimedJob();
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores(), note: ['a'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['note']);
    expect(await Review.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('ignores a total sent by the client and stores its own', async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).map((s) => (s.key === 'spacing' ? { ...s, score: 2, comment: 'Hall sparse' } : s));
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores, score: 100, total: 100, passed: true });
    // Applicable weights for the complete test record: all but reflective (10), damage (14), splits (6), lighting (6) → 64.
    // Spacing (12) at 2/4 loses 6: 100 × (64 − 6) / 64 = 90.625 → 90.6
    expect(res.body.score).toBe(90.6);
    expect(Number((await Review.findOne({ where: { jobId: job.id } }))!.score)).toBe(90.6);
  });

  it('requests rework: one item per criterion below full marks, with the instruction, and pauses the due clock', async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).map((s) =>
      s.key === 'coverage'
        ? { ...s, score: 2, comment: 'Attic missing: capture it from the hatch', stockReason: 'Attic not captured' }
        : s.key === 'record_accuracy'
          ? { ...s, score: 3, comment: 'Total station count is off by one' }
          : s,
    );
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores });
    expect(res.status).toBe(201);
    const items = await ReworkItem.findAll({ where: { jobId: job.id }, order: [['id', 'ASC']] });
    expect(items.map((i) => [i.criterionKey, i.instruction, i.stockReason])).toEqual([
      ['coverage', 'Attic missing: capture it from the hatch', 'Attic not captured'],
      ['record_accuracy', 'Total station count is off by one', null],
    ]);
    const reloaded = await Job.findByPk(job.id);
    expect(reloaded!.status).toBe('rework_requested');
    expect(reloaded!.pausedAt).not.toBeNull();
  });

  it('refuses to accept a failing review and writes nothing', async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).map((s) =>
      s.key === 'registration' ? { ...s, score: 0, comment: 'Kitchen station misplaced' } : s,
    );
    const before = await countRows('reviews');
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.decision).toMatch(/Critical criterion "Registration integrity" is at its lowest level/);
    expect(await countRows('reviews')).toBe(before);
    expect((await Job.findByPk(job.id))!.status).toBe('in_review');
  });

  it('asks for a comment on every criterion below full marks, and a score on every applicable one', async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).filter((s) => s.key !== 'coverage').map((s) => (s.key === 'spacing' ? { ...s, score: 3 } : s));
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'rework', scores });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      'scores.coverage': 'Score this criterion',
      'scores.spacing.comment': 'Explain what falls short',
    });
  });

  it('refuses a score on a criterion that does not apply', async () => {
    const { agent, job } = await claimedJob();
    const scores = (await fullScores()).map((s) => (s.key === 'reflective' ? { ...s, score: 4 } : s));
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores });
    expect(res.body.error.fields).toEqual({ 'scores.reflective': 'This criterion does not apply to this record' });
  });

  it('refuses a reviewer without the claim', async () => {
    const { agent } = await signedInAgent(app, 'reviewer');
    const job = await createSubmittedJob();
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(res.status).toBe(409);
  });

  it('keeps the rubric version a review was scored with when the rubric changes', async () => {
    const { agent, job } = await claimedJob();
    await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    const review = await Review.findOne({ where: { jobId: job.id } });
    const usedVersion = (await Rubric.findByPk(review!.rubricId))!.version;

    const { agent: manager } = await signedInAgent(app, 'manager');
    const edited = { ...DEFAULT_RUBRIC, passMark: 90 };
    const created = await manager.post('/api/rubrics').send(edited);
    try {
      expect(created.status).toBe(201);
      expect(created.body.rubric.version).toBeGreaterThan(usedVersion);
      const again = await Review.findByPk(review!.id);
      expect((await Rubric.findByPk(again!.rubricId))!.version).toBe(usedVersion);
      const current = await manager.get('/api/rubrics/current');
      expect(current.body.rubric.passMark).toBe(90);
    } finally {
      // The edited version goes again, pass or fail, so every other test scores against the default.
      if (created.body.rubric) await Rubric.destroy({ where: { id: created.body.rubric.id } });
    }
  });
});

describe('blind second reviews', () => {
  it('draws an accepted first review for a second review when the draw says so', async () => {
    const reviewer = await createUser({ role: 'reviewer' });
    const job = await claimFor(await createSubmittedJob(), reviewer.id);
    const actor = { id: reviewer.id, name: reviewer.name, email: reviewer.email, role: 'reviewer' as const };
    const result = await submitReview(actor, job.id, { decision: 'accept', scores: await fullScores() }, () => 0.01);
    expect(result.sampledForSecondReview).toBe(true);
    expect(await SecondReview.count({ where: { jobId: job.id } })).toBe(1);

    const other = await claimFor(await createSubmittedJob(), reviewer.id);
    const notDrawn = await submitReview(actor, other.id, { decision: 'accept', scores: await fullScores() }, () => 0.99);
    expect(notDrawn.sampledForSecondReview).toBe(false);
  });

  it('lets another reviewer score it blind, without changing the job, and never the first reviewer', async () => {
    const second = await secondReviewByAnother();
    const { agent } = await signedInAgent(app, 'reviewer');
    const list = await agent.get('/api/second-reviews');
    expect(list.body.secondReviews.map((s: { id: number }) => s.id)).toContain(second.id);

    const workspace = await agent.get(`/api/jobs/${second.jobId}/workspace?second=${second.id}`);
    expect(workspace.status).toBe(200);
    expect(JSON.stringify(workspace.body)).not.toMatch(/"score":100/);
    expect(workspace.body.secondClaimedByMe).toBe(false);

    const unclaimed = await agent.post(`/api/second-reviews/${second.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(unclaimed.status).toBe(409);
    expect((await agent.post(`/api/second-reviews/${second.id}/claim`)).status).toBe(200);
    const { agent: other } = await signedInAgent(app, 'reviewer');
    const taken = await other.post(`/api/second-reviews/${second.id}/claim`);
    expect(taken.status).toBe(409);
    expect(taken.body.error.message).toBe('Another reviewer is scoring this second review.');

    const res = await agent.post(`/api/second-reviews/${second.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(res.status).toBe(201);
    expect((await Job.findByPk(second.jobId))!.status).toBe('accepted');
    expect((await SecondReview.findByPk(second.id))!.secondReviewId).toBe(res.body.reviewId);
  });

  it('refuses the first reviewer', async () => {
    const second = await secondReviewByAnother();
    const firstReviewer = await createUser({ role: 'reviewer' });
    await second.update({ firstReviewerId: firstReviewer.id });
    const { default: request } = await import('supertest');
    const agent = request.agent(app).set('x-sightline-request', '1');
    await agent.post('/api/session').send({ email: firstReviewer.email, password: 'correct-horse-battery' });
    const res = await agent.post(`/api/second-reviews/${second.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(res.status).toBe(403);
  });
});

describe('GET /api/queue', () => {
  it('puts overdue jobs first, then by due time, and pages on the server', async () => {
    const technician = await createUser({ role: 'technician' });
    const overdue = await createSubmittedJob({ technicianId: technician.id, dueAt: new Date(Date.now() - 3_600_000) });
    const soon = await createSubmittedJob({ technicianId: technician.id, dueAt: new Date(Date.now() + 3_600_000) });
    const later = await createSubmittedJob({ technicianId: technician.id, dueAt: new Date(Date.now() + 7_200_000) });
    const { agent } = await signedInAgent(app, 'reviewer');
    const page1 = await agent.get(`/api/queue?technicianId=${technician.id}&pageSize=5`);
    expect(page1.body.rows.map((r: { id: number }) => r.id)).toEqual([overdue.id, soon.id, later.id]);
    expect(page1.body.total).toBe(3);
    const page2 = await agent.get(`/api/queue?technicianId=${technician.id}&pageSize=5&page=2`);
    expect(page2.body.rows).toEqual([]);
    expect(page1.body.counts.submitted).toBeGreaterThanOrEqual(3);
  });

  it('filters resubmissions, claimed-by-me and camera class', async () => {
    const technician = await createUser({ role: 'technician' });
    const { agent, user } = await signedInAgent(app, 'reviewer');
    const first = await createSubmittedJob({ technicianId: technician.id });
    const resubmitted = await createSubmittedJob({ technicianId: technician.id, revision: 2 });
    const mine = await claimFor(
      await createSubmittedJob({ technicianId: technician.id, record: completeRecord({ cameraClass: 'camera_360' }) }),
      user.id,
    );
    const ids = async (q: string) =>
      (await agent.get(`/api/queue?technicianId=${technician.id}&${q}`)).body.rows.map((r: { id: number }) => r.id);
    expect(await ids('submission=resubmission')).toEqual([resubmitted.id]);
    expect(await ids('claimedByMe=true')).toEqual([mine.id]);
    expect(await ids('cameraClass=camera_360')).toEqual([mine.id]);
    expect((await ids('submission=first')).sort()).toEqual([first.id, mine.id].sort());
  });

  it('shows who holds a live claim and drops an expired one', async () => {
    const technician = await createUser({ role: 'technician' });
    const holder = await createUser({ role: 'reviewer', name: 'Holder Reviewer' });
    const live = await claimFor(await createSubmittedJob({ technicianId: technician.id }), holder.id, 10);
    const stale = await claimFor(await createSubmittedJob({ technicianId: technician.id }), holder.id, -5);
    const { agent } = await signedInAgent(app, 'manager');
    const rows = (await agent.get(`/api/queue?technicianId=${technician.id}`)).body.rows as {
      id: number;
      claimedBy: { name: string } | null;
    }[];
    expect(rows.find((r) => r.id === live.id)!.claimedBy!.name).toBe('Holder Reviewer');
    expect(rows.find((r) => r.id === stale.id)!.claimedBy).toBeNull();
  });

  it('refuses an unknown sort by name', async () => {
    const { agent } = await signedInAgent(app, 'reviewer');
    const res = await agent.get('/api/queue?sort=mood');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('sort');
  });
});
