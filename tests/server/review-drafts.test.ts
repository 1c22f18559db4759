// Review drafts: a reviewer's unsaved scores, kept per claim, for that reviewer only.
import { createApp } from '../../server/app';
import { ReviewDraft, sequelize } from '../../server/models';
import { claimFor, createSubmittedJob, createUser, fullScores, secondReviewByAnother } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

async function halfScored() {
  const scores = await fullScores();
  return scores.map((s, i) =>
    i % 2 === 0 ? { ...s, score: s.score === null ? null : 2, comment: 'Two rooms short of stations' } : { ...s, score: null },
  );
}

async function reviewerWithClaim() {
  const signed = await signedInAgent(app, 'reviewer');
  const job = await claimFor(await createSubmittedJob(), signed.user.id);
  return { ...signed, job };
}

describe('PUT /api/jobs/:id/review-draft', () => {
  it('keeps half a rubric and gives it back in the workspace after a reload', async () => {
    const { agent, job } = await reviewerWithClaim();
    const scores = await halfScored();
    const saved = await agent.put(`/api/jobs/${job.id}/review-draft`).set('If-Match', '"0"').send({ scores, decision: 'rework' });
    expect(saved.status).toBe(200);
    expect(saved.body.draft).toMatchObject({ version: 1, decision: 'rework', revision: 1 });
    const workspace = await agent.get(`/api/jobs/${job.id}/workspace`);
    expect(workspace.body.draft.scores).toEqual(scores);
    expect(workspace.body.draft.decision).toBe('rework');
  });

  it('shows the draft to nobody else: not another reviewer, not a manager', async () => {
    const { agent, job } = await reviewerWithClaim();
    await agent
      .put(`/api/jobs/${job.id}/review-draft`)
      .set('If-Match', '"0"')
      .send({ scores: await halfScored(), decision: null });
    const { agent: other } = await signedInAgent(app, 'reviewer');
    expect((await other.get(`/api/jobs/${job.id}/workspace`)).body.draft).toBeNull();
    const { agent: manager } = await signedInAgent(app, 'manager');
    expect((await manager.get(`/api/jobs/${job.id}/workspace`)).body.draft).toBeNull();
    const write = await other.put(`/api/jobs/${job.id}/review-draft`).set('If-Match', '"0"').send({ scores: [], decision: null });
    expect(write.status).toBe(409);
  });

  it('answers 409 with the current draft when the save is based on an old version', async () => {
    const { agent, job } = await reviewerWithClaim();
    await agent.put(`/api/jobs/${job.id}/review-draft`).set('If-Match', '"0"').send({ scores: [], decision: 'accept' });
    const stale = await agent.put(`/api/jobs/${job.id}/review-draft`).set('If-Match', '"0"').send({ scores: [], decision: 'rework' });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ version: 1, decision: 'accept' });
  });

  it('is dropped when the decision is recorded', async () => {
    const { agent, job } = await reviewerWithClaim();
    await agent
      .put(`/api/jobs/${job.id}/review-draft`)
      .set('If-Match', '"0"')
      .send({ scores: await halfScored(), decision: null });
    const decided = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores() });
    expect(decided.status).toBe(201);
    expect(await ReviewDraft.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('is dropped when a manager moves the claim to another reviewer', async () => {
    const { agent, job } = await reviewerWithClaim();
    await agent
      .put(`/api/jobs/${job.id}/review-draft`)
      .set('If-Match', '"0"')
      .send({ scores: await halfScored(), decision: null });
    const { agent: manager } = await signedInAgent(app, 'manager');
    const to = await createUser({ role: 'reviewer' });
    expect((await manager.post('/api/claims/reassign').send({ toReviewerId: to.id, jobIds: [job.id] })).status).toBe(200);
    expect(await ReviewDraft.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('keeps a blind second review draft apart, for its own claimant only', async () => {
    const second = await secondReviewByAnother();
    const { agent } = await signedInAgent(app, 'reviewer');
    expect((await agent.post(`/api/second-reviews/${second.id}/claim`)).status).toBe(200);
    const scores = await halfScored();
    const saved = await agent
      .put(`/api/jobs/${second.jobId}/review-draft?second=${second.id}`)
      .set('If-Match', '"0"')
      .send({ scores, decision: null });
    expect(saved.status).toBe(200);
    const mine = await agent.get(`/api/jobs/${second.jobId}/workspace?second=${second.id}`);
    expect(mine.body.draft.scores).toEqual(scores);
    const { agent: other } = await signedInAgent(app, 'reviewer');
    expect((await other.get(`/api/jobs/${second.jobId}/workspace?second=${second.id}`)).body.draft).toBeNull();
  });
});
