import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { CaptureRevision, Job, sequelize } from '../../server/models';
import { feetToMetres } from '../../shared/units';
import { countRows, resetSignInLimits, saveRecordAs, signedInAgent, submitRecordAs, technicianWithJob } from '../helpers/http';
import { completeRecord, confirmedNow, room } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('PUT /api/jobs/:id/record', () => {
  it('autosaves an incomplete draft and returns it on the next load', async () => {
    const { agent, job } = await technicianWithJob(app);
    const draft = { ...completeRecord(), cameraClass: null, totalStations: null, processing: { confirmed: false, confirmedAt: null } };
    const first = await saveRecordAs(agent, job.id, draft);
    expect(first.status).toBe(200);
    const second = await saveRecordAs(agent, job.id, { ...draft, notes: 'Back bedroom door was locked' });
    expect(second.body.version).toBe(first.body.version + 1);
    const loaded = await agent.get(`/api/jobs/${job.id}`);
    expect(loaded.body.record.notes).toBe('Back bedroom door was locked');
    expect(loaded.body.record.rooms[0].lengthM).toBeCloseTo(feetToMetres(12), 12);
  });

  it('answers 404 when another technician tries to save', async () => {
    const { job } = await technicianWithJob(app);
    const { agent: other } = await signedInAgent(app, 'technician');
    expect((await saveRecordAs(other, job.id, completeRecord())).status).toBe(404);
  });

  it('refuses changes once the record is submitted', async () => {
    const { agent, job } = await technicianWithJob(app);
    await submitRecordAs(agent, job.id, completeRecord());
    const res = await saveRecordAs(agent, job.id, completeRecord({ notes: 'late edit' }));
    expect(res.status).toBe(409);
  });
});

describe('POST /api/jobs/:id/submit', () => {
  it('freezes revision 1, marks the job submitted and reports warnings without blocking', async () => {
    const { agent, job, user } = await technicianWithJob(app);
    const record = completeRecord({
      rooms: [room({ lengthM: feetToMetres(12), widthM: feetToMetres(15), stations: 5, doorwayStation: false })],
    });
    const res = await submitRecordAs(agent, job.id, record);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ revision: 1, status: 'submitted' });
    expect(res.body.warnings.map((w: { field: string }) => w.field)).toEqual(['rooms.0.doorwayStation']);
    const revision = await CaptureRevision.findOne({ where: { jobId: job.id, number: 1 } });
    expect(revision!.data.rooms[0].doorwayStation).toBe(false);
    expect(revision!.submittedById).toBe(user.id);
    expect((await Job.findByPk(job.id))!.status).toBe('submitted');
  });

  it('refuses a record with missing facts, naming each field, and writes nothing', async () => {
    const { agent, job } = await technicianWithJob(app);
    const before = await countRows('capture_revisions');
    const res = await submitRecordAs(
      agent,
      job.id,
      completeRecord({ totalStations: 9, processing: { confirmed: false, confirmedAt: null } }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      'processing.confirmed': 'Confirm that processing started on the capture platform.',
      totalStations: 'Total stations (9) must equal stations in rooms plus exterior (5).',
    });
    expect(await countRows('capture_revisions')).toBe(before);
    expect((await Job.findByPk(job.id))!.status).toBe('draft');
  });

  it('refuses a damage-area photo that is not attached to the job', async () => {
    const { agent, job } = await technicianWithJob(app);
    const record = completeRecord({
      damageAreas: [{ key: 'd1', roomKey: 'r1', description: 'Stain', lossType: 'water', stationNumbers: [2], photoFileIds: [987654] }],
    });
    const res = await submitRecordAs(agent, job.id, record);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ 'damageAreas.0.photoFileIds': 'A photo is not attached to this job' });
  });

  it('keeps revision 1 unchanged when the record is reworked and resubmitted as revision 2', async () => {
    const { agent, job } = await technicianWithJob(app);
    await submitRecordAs(agent, job.id, completeRecord({ notes: 'first pass' }));
    await Job.update({ status: 'rework_requested' }, { where: { id: job.id } });

    await saveRecordAs(agent, job.id, completeRecord({ notes: 'added attic stations' }));
    // The confirmation made for revision 1 does not carry over.
    const stale = await submitRecordAs(agent, job.id, completeRecord({ notes: 'added attic stations' }));
    expect(stale.status).toBe(400);
    expect(stale.body.error.fields['processing.confirmed']).toMatch(/Confirm processing again for this revision/);
    const second = await submitRecordAs(agent, job.id, completeRecord({ notes: 'added attic stations', processing: confirmedNow() }));
    expect(second.body).toMatchObject({ revision: 2, status: 'resubmitted' });

    const one = await agent.get(`/api/jobs/${job.id}/revisions/1`);
    const two = await agent.get(`/api/jobs/${job.id}/revisions/2`);
    expect(one.body.revision.record.notes).toBe('first pass');
    expect(two.body.revision.record.notes).toBe('added attic stations');
    const detail = await agent.get(`/api/jobs/${job.id}`);
    expect(detail.body.revisions.map((r: { number: number }) => r.number)).toEqual([1, 2]);
  });

  it('cannot be rewritten in the database either: the table refuses updates', async () => {
    const { agent, job } = await technicianWithJob(app);
    await submitRecordAs(agent, job.id, completeRecord({ notes: 'as captured' }));
    await expect(
      sequelize.query('UPDATE capture_revisions SET data = ? WHERE job_id = ?', {
        replacements: [JSON.stringify(completeRecord({ notes: 'rewritten' })), job.id],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/immutable/);
    const revision = await CaptureRevision.findOne({ where: { jobId: job.id } });
    expect(revision!.data.notes).toBe('as captured');
  });
});

describe('GET /api/jobs/:id/revisions/:number', () => {
  it('lets a reviewer read a submitted revision and answers 404 for one that does not exist', async () => {
    const { agent, job } = await technicianWithJob(app);
    await submitRecordAs(agent, job.id, completeRecord());
    const { agent: reviewer } = await signedInAgent(app, 'reviewer');
    expect((await reviewer.get(`/api/jobs/${job.id}/revisions/1`)).status).toBe(200);
    expect((await reviewer.get(`/api/jobs/${job.id}/revisions/2`)).status).toBe(404);
  });
});
