// Conflicts are detected, never silently resolved: every save and submit names the draft version
// it was based on, and a stale one gets 409 with the current draft.
import { createApp } from '../../server/app';
import { CaptureDraft, CaptureRevision, sequelize } from '../../server/models';
import { countRows, resetSignInLimits, technicianWithJob } from '../helpers/http';
import { completeRecord } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('PUT /api/jobs/:id/record with If-Match', () => {
  it('saves when the version matches, and answers the next version', async () => {
    const { agent, job } = await technicianWithJob(app);
    const first = await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send(completeRecord({ notes: 'first' }));
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(2);
    const second = await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"2"')
      .send(completeRecord({ notes: 'second' }));
    expect(second.body.version).toBe(3);
  });

  it('refuses a stale save with 409 and the current draft, and keeps the newer one', async () => {
    const { agent, job } = await technicianWithJob(app);
    await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send(completeRecord({ notes: 'from the phone' }));
    // A second tab, opened before that save, still thinks the draft is at version 1 (a new job's).
    const stale = await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send(completeRecord({ notes: 'from the old tab' }));
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    expect(stale.body.current).toMatchObject({ version: 2, record: { notes: 'from the phone' } });
    expect(typeof stale.body.current.savedAt).toBe('string');
    const draft = await CaptureDraft.findByPk(job.id);
    expect(draft!.data.notes).toBe('from the phone');
    expect(draft!.version).toBe(2);
  });

  it('refuses a save without If-Match (428) and writes nothing', async () => {
    const { agent, job } = await technicianWithJob(app);
    const before = await countRows('capture_drafts');
    const res = await agent.put(`/api/jobs/${job.id}/record`).send(completeRecord());
    expect(res.status).toBe(428);
    expect(res.body.error.fields).toEqual({ 'If-Match': 'Missing' });
    expect(await countRows('capture_drafts')).toBe(before);
  });

  it('refuses an If-Match that is not a version number', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.put(`/api/jobs/${job.id}/record`).set('If-Match', 'latest').send(completeRecord());
    expect(res.status).toBe(428);
  });
});

describe('POST /api/jobs/:id/submit with If-Match', () => {
  it('refuses a submit based on an old draft (409 with the current one) and creates no revision', async () => {
    const { agent, job } = await technicianWithJob(app);
    await agent
      .put(`/api/jobs/${job.id}/record`)
      .set('If-Match', '"1"')
      .send(completeRecord({ notes: 'newer, from the tablet' }));
    const before = await countRows('capture_revisions');
    const res = await agent
      .post(`/api/jobs/${job.id}/submit`)
      .set('If-Match', '"1"')
      .send(completeRecord({ notes: 'older' }));
    expect(res.status).toBe(409);
    expect(res.body.current.record.notes).toBe('newer, from the tablet');
    expect(await countRows('capture_revisions')).toBe(before);
  });

  it('increments the draft version, so a tab that did not see the submit cannot save over it', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.post(`/api/jobs/${job.id}/submit`).set('If-Match', '"1"').send(completeRecord());
    expect(res.status).toBe(201);
    expect(res.body.recordVersion).toBe(2);
    expect((await CaptureDraft.findByPk(job.id))!.version).toBe(2);
    expect(await CaptureRevision.count({ where: { jobId: job.id } })).toBe(1);
  });
});
