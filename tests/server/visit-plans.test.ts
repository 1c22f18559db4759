// The visit plan routes: saved as a versioned draft by the assigned technician, read by every
// role that reads the job, refused field by field when malformed (nothing written), and used
// by the pre-submit checks. Times per station are Sightline's defaults (from memory).
import { createApp } from '../../server/app';
import { CameraClassSetting, sequelize, VisitPlanRow } from '../../server/models';
import { recordFromPlan } from '../../shared/plan-record';
import { createJob, reworkRequested } from '../helpers/factories';
import { type Agent, countRows, resetSignInLimits, signedInAgent, submitRecordAs, technicianWithJob } from '../helpers/http';
import { housePlan } from '../helpers/plans';
import { completeRecord, confirmedNow } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const savePlan = (agent: Agent, jobId: number, plan: object, version: number) =>
  agent.put(`/api/jobs/${jobId}/plan`).set('If-Match', `"${version}"`).send(plan);

describe('PUT and GET /api/jobs/:id/plan', () => {
  it('saves the plan as a new version each time and returns it to every reader of the job', async () => {
    const { agent, job } = await technicianWithJob(app);
    expect((await agent.get(`/api/jobs/${job.id}/plan`)).body).toMatchObject({ version: 0, savedAt: null, plan: { structures: [] } });
    const first = await savePlan(agent, job.id, housePlan(), 0);
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(1);
    const second = await savePlan(agent, job.id, housePlan({ notes: 'Dog in the yard' }), 1);
    expect(second.body.version).toBe(2);

    const { agent: reviewer } = await signedInAgent(app, 'reviewer');
    const read = await reviewer.get(`/api/jobs/${job.id}/plan`);
    expect(read.status).toBe(200);
    expect(read.body.plan.notes).toBe('Dog in the yard');
    expect(read.body.plan.models.map((m: { structure: string }) => m.structure)).toEqual([
      'main_dwelling',
      'detached_garage',
      'crawl_space',
    ]);
  });

  it('keeps only the plan’s own fields', async () => {
    const { agent, job } = await technicianWithJob(app);
    await savePlan(agent, job.id, { ...housePlan(), extra: 'ignored', rooms: [{ ...housePlan().rooms[0], colour: 'red' }] }, 0);
    const row = await VisitPlanRow.findByPk(job.id);
    expect(row!.data).not.toHaveProperty('extra');
    expect(row!.data.rooms[0]).not.toHaveProperty('colour');
  });

  it('refuses a save based on an older version with 409 and the current plan, and writes nothing', async () => {
    const { agent, job } = await technicianWithJob(app);
    await savePlan(agent, job.id, housePlan({ notes: 'from the phone' }), 0);
    const stale = await savePlan(agent, job.id, housePlan({ notes: 'from the tablet' }), 0);
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    expect(stale.body.current.plan.notes).toBe('from the phone');
    expect((await VisitPlanRow.findByPk(job.id))!.data.notes).toBe('from the phone');
  });

  it('answers 404 to another technician, and 403 to a reviewer or manager writing', async () => {
    const { job } = await technicianWithJob(app);
    const { agent: other } = await signedInAgent(app, 'technician');
    expect((await other.get(`/api/jobs/${job.id}/plan`)).status).toBe(404);
    expect((await savePlan(other, job.id, housePlan(), 0)).status).toBe(404);
    const { agent: manager } = await signedInAgent(app, 'manager');
    expect((await savePlan(manager, job.id, housePlan(), 0)).status).toBe(403);
    expect(await VisitPlanRow.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('is editable while the record is, so also during rework, and not once submitted', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const { job: rework } = await reworkRequested(user.id);
    expect((await savePlan(agent, rework.id, housePlan(), 0)).status).toBe(200);
    const submitted = await createJob({ technicianId: user.id, status: 'submitted' });
    const res = await savePlan(agent, submitted.id, housePlan(), 0);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/cannot be changed while the job is/);
  });

  it('refuses models that name a structure not in the plan, and leaving before arriving', async () => {
    const { agent, job } = await technicianWithJob(app);
    const plan = housePlan();
    plan.models[1].structureKeys = ['s-barn'];
    plan.onSite = { arrivedAt: '2026-11-30T10:00:00.000Z', leftAt: '2026-11-30T09:00:00.000Z' };
    const res = await savePlan(agent, job.id, plan, 0);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['models.1.structureKeys', 'onSite.leftAt']);
    expect(await VisitPlanRow.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('stores planned and actual minutes on site for the team table', async () => {
    const { agent, job } = await technicianWithJob(app);
    // 12 × 15 ft → 5 stations, 10 × 10 ft → 3; default depth camera: 20 min + 8 × 1.5 min = 32 min.
    await savePlan(agent, job.id, housePlan({ onSite: { arrivedAt: '2026-11-30T09:00:00.000Z', leftAt: '2026-11-30T09:41:00.000Z' } }), 0);
    const row = await VisitPlanRow.findByPk(job.id);
    expect([row!.plannedMinutes, row!.actualMinutes]).toEqual([32, 41]);
  });

  for (const [field, value] of [
    ['structures', 'house'],
    ['structures.0.kind', 'castle'],
    ['structures.0.reachableInside', 'yes'],
    ['structures.0.name', ['House']],
    ['cameraClass', 'pinhole'],
    ['conditions', 'sunny'],
    ['conditions.directSun', 1],
    ['models.0.structureKeys', 's-house'],
    ['models.0.splitReason', 'bored'],
    ['startLevel', 'roof'],
    ['units', 'cubits'],
    ['rooms.0.level', { level: 'ground' }],
    ['rooms.0.lengthM', 1000],
    ['hazards', ['standing_water', 'dragons']],
    ['kitTicked', 'Tripod'],
    ['onSite.arrivedAt', 'half past nine'],
    ['notes', 42],
  ] as const) {
    it(`refuses a bad ${field}, naming it, and writes nothing`, async () => {
      const { agent, job } = await technicianWithJob(app);
      const plan = structuredClone(housePlan()) as unknown as Record<string, unknown>;
      const parts = field.split('.');
      let at = plan as Record<string, unknown>;
      for (const part of parts.slice(0, -1)) at = at[part] as Record<string, unknown>;
      at[parts.at(-1)!] = value;
      const before = await countRows('visit_plans');
      const res = await savePlan(agent, job.id, plan, 0);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields).some((f) => f === field || f.startsWith(`${field}.`))).toBe(true);
      expect(await countRows('visit_plans')).toBe(before);
    });
  }
});

describe('planned against actual time on site in the team table', () => {
  it('sums the timed visits of the period per technician', async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const jobs = [
      await createJob({ technicianId: user.id }),
      await createJob({ technicianId: user.id }),
      await createJob({ technicianId: user.id }),
    ];
    // 32 planned each (see above); 41 and 50 minutes actual; the third visit has no leaving time.
    await savePlan(
      agent,
      jobs[0].id,
      housePlan({ onSite: { arrivedAt: '2026-11-30T09:00:00.000Z', leftAt: '2026-11-30T09:41:00.000Z' } }),
      0,
    );
    await savePlan(
      agent,
      jobs[1].id,
      housePlan({ onSite: { arrivedAt: '2026-11-30T13:00:00.000Z', leftAt: '2026-11-30T13:50:00.000Z' } }),
      0,
    );
    await savePlan(agent, jobs[2].id, housePlan(), 0);
    const { agent: manager } = await signedInAgent(app, 'manager');
    const today = new Date().toISOString().slice(0, 10);
    const res = await manager.get(`/api/trends/team?from=${today}&to=${today}`);
    const mine = res.body.rows.find((r: { technician: { id: number } }) => r.technician.id === user.id);
    expect(mine.visits).toEqual({ timed: 2, plannedMinutes: 64, actualMinutes: 91 });
  });
});

describe('the plan at submit', () => {
  it('warns, without blocking, of a planned model and room the record lacks', async () => {
    const { agent, job } = await technicianWithJob(app);
    await savePlan(agent, job.id, housePlan(), 0);
    const res = await submitRecordAs(agent, job.id, completeRecord({ processing: confirmedNow() }));
    expect(res.status).toBe(201);
    const messages = res.body.warnings.map((w: { message: string }) => w.message);
    expect(messages).toEqual(expect.arrayContaining(['Planned model missing: Garage.', 'Planned room missing: Hall.']));
  });

  it('has nothing to say when the record was filled from the plan', async () => {
    const { agent, job } = await technicianWithJob(app);
    await savePlan(agent, job.id, housePlan(), 0);
    const filled = recordFromPlan(housePlan());
    const record = {
      ...filled,
      totalStations: 8,
      glazingFlagged: 'yes',
      models: filled.models.map((m, i) => ({ ...m, platformReference: `MDL-${i + 1}` })),
      rooms: filled.rooms.map((r) => ({ ...r, doorwayStation: true })),
      processing: confirmedNow(),
    };
    const res = await submitRecordAs(agent, job.id, record);
    expect(res.status).toBe(201);
    expect(res.body.warnings.filter((w: { message: string }) => w.message.startsWith('Planned'))).toEqual([]);
  });
});

describe('camera class settings', () => {
  it('lists every camera class with the defaults until a manager changes one', async () => {
    await CameraClassSetting.destroy({ where: { cameraClass: 'handheld_lidar' } });
    const { agent } = await signedInAgent(app, 'technician');
    const res = await agent.get('/api/camera-classes');
    expect(res.status).toBe(200);
    expect(res.body.cameraClasses.map((c: { cameraClass: string }) => c.cameraClass)).toEqual([
      'tripod_depth',
      'camera_360',
      'handheld_lidar',
      'laser_scanner',
    ]);
    const lidar = res.body.cameraClasses.find((c: { cameraClass: string }) => c.cameraClass === 'handheld_lidar');
    expect(lidar).toMatchObject({ version: 0, minutesPerStation: null, setupMinutes: 20 });
    expect(lidar.kitItems).toContain('Door wedges');
  });

  // The laser scanner's settings: the browser tests plan with the depth camera's defaults.
  it('lets a manager change the kit and times, version-checked, and plans use the new times', async () => {
    await CameraClassSetting.destroy({ where: { cameraClass: 'laser_scanner' } });
    const { agent: manager } = await signedInAgent(app, 'manager');
    const body = { kitItems: [' Survey tripod ', 'Spare battery'], minutesPerStation: 2, setupMinutes: 10 };
    const saved = await manager.put('/api/camera-classes/laser_scanner').set('If-Match', '"0"').send(body);
    expect(saved.status).toBe(200);
    expect(saved.body.settings).toMatchObject({ kitItems: ['Survey tripod', 'Spare battery'], minutesPerStation: 2, version: 1 });
    expect((await manager.put('/api/camera-classes/laser_scanner').set('If-Match', '"0"').send(body)).status).toBe(409);

    const { agent, job } = await technicianWithJob(app);
    await savePlan(agent, job.id, housePlan({ cameraClass: 'laser_scanner' }), 0);
    // At 10 m spacing each room (16.7 m² and 9.3 m²) needs 1 station: 10 min + 2 × 2 min = 14 min.
    expect((await VisitPlanRow.findByPk(job.id))!.plannedMinutes).toBe(14);
    await CameraClassSetting.destroy({ where: { cameraClass: 'laser_scanner' } });
  });

  it('refuses a technician or reviewer changing the settings', async () => {
    for (const role of ['technician', 'reviewer', 'admin'] as const) {
      const { agent } = await signedInAgent(app, role);
      const res = await agent
        .put('/api/camera-classes/camera_360')
        .set('If-Match', '"0"')
        .send({ kitItems: ['x'], setupMinutes: 1 });
      expect(res.status).toBe(403);
    }
  });
});
