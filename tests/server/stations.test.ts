import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import { countRows, resetSignInLimits, saveRecordAs, signedInAgent, submitRecordAs, technicianWithJob } from '../helpers/http';
import { completeRecord } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

// A hall walked every 5 ft, then one station 13 ft further on: one weak link (common-practice limit 6 ft).
const CSV = [
  'station,level,x,y,unit,room,kind',
  '1,ground,0,0,ft,Kitchen,station',
  '2,ground,5,0,ft,Kitchen,station',
  '3,ground,10,0,ft,Kitchen,station',
  '4,ground,23,0,ft,Kitchen,station',
  '5,ground,3,3,ft,Kitchen,panorama',
].join('\n');

describe('station coordinate files', () => {
  it('refuses a file with bad rows, naming line and column, and stores nothing', async () => {
    const { agent, job } = await technicianWithJob(app);
    const before = await countRows('files');
    const bad = 'station,level,x,y,unit,room,kind\n1,ground,0,0,ft,,station\n1,ground,x,0,furlong,,station\n';
    const res = await agent
      .post(`/api/jobs/${job.id}/files`)
      .field('kind', 'station_coordinates')
      .attach('file', Buffer.from(bad), 'stations.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toBe(
      'The station file has 3 problem(s): line 3, station: Duplicate station number 1 (first on line 2); line 3, x: Not a number: "x"; line 3, unit: Unknown unit "furlong" (use ft or m)',
    );
    expect(await countRows('files')).toBe(before);
  });

  it('analyses the working record before submit and stores the analysis with the revision', async () => {
    const { agent, job } = await technicianWithJob(app);
    const upload = await agent
      .post(`/api/jobs/${job.id}/files`)
      .field('kind', 'station_coordinates')
      .attach('file', Buffer.from(CSV), 'stations.csv');
    expect(upload.status).toBe(201);
    await saveRecordAs(agent, job.id, completeRecord());

    const draft = await agent.get(`/api/jobs/${job.id}/station-analysis`);
    expect(draft.status).toBe(200);
    const [level] = draft.body.analysis.levels;
    expect(level).toMatchObject({ level: 'ground', registered: 4, panoramas: 1 });
    // #4 is 13 ft (3.9624 m) from #3, beyond 6 ft (1.8288 m): the only weak link, and sparse.
    expect(level.weakLinks.map((l: { station: number; from: number }) => [l.station, l.from])).toEqual([[4, 3]]);
    expect(level.weakLinks[0].distance).toBeCloseTo(13 * 0.3048, 10);
    expect(level.sparse).toEqual([4]);
    // Kitchen 12 × 15 ft = 180 ft² needs 5 stations at 6 ft (common practice); 4 registered.
    expect(level.rooms[0]).toMatchObject({ room: 'Kitchen', stations: 4, expected: 5, short: true });

    // The file has 4 registered stations on the ground floor; the record says 5: a warning for
    // the technician at submit, kept in the revision's findings for the reviewer.
    const submitted = await submitRecordAs(agent, job.id, completeRecord());
    const mismatch = 'The station file has 4 stations on the ground floor; the record says 5.';
    expect(submitted.body.warnings).toContainEqual({ field: 'levels', message: mismatch });
    const stored = await agent.get(`/api/jobs/${job.id}/station-analysis?revision=1`);
    expect(stored.body.analysis.levels[0].weakLinks).toHaveLength(1);
    const { agent: reviewer } = await signedInAgent(app, 'reviewer');
    const workspace = await reviewer.get(`/api/jobs/${job.id}/workspace`);
    expect(workspace.body.revision.stationAnalysis.levels[0].sparse).toEqual([4]);
    expect(workspace.body.revision.findings.warnings).toContainEqual({ field: 'levels', message: mismatch });
  });

  it('answers with no analysis when no station file is attached', async () => {
    const { agent, job } = await technicianWithJob(app);
    expect((await agent.get(`/api/jobs/${job.id}/station-analysis`)).body.analysis).toBeNull();
  });
});
