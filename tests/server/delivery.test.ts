// Delivery to the adjuster: claim contacts on the job, the acceptance summary PDF (its text
// read back with poppler's pdftotext), the adjuster's e-mail with a share link, and the
// link's rules (its job only, 404 for a wrong token, 410 when expired or withdrawn).
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { createApp } from '../../server/app';
import { AuditEvent, Delivery, OutboxMessage, sequelize, ShareLink, StoredFile } from '../../server/models';
import { buildPendingSummaries } from '../../server/services/delivery-service';
import { analyseFor } from '../../server/services/station-service';
import { getObjectStream, putObject } from '../../server/storage/s3';
import type { CaptureRecord } from '../../shared/capture-record';
import { feetToMetres } from '../../shared/units';
import {
  claimFor,
  createJob,
  createRevision,
  createStoredFile,
  createSubmittedJob,
  createUser,
  fullScores,
  newJobBody,
} from '../helpers/factories';
import { clientAgent, resetSignInLimits, signedInAgent } from '../helpers/http';
import { completeRecord, room } from '../helpers/records';
import { PNG_1X1 } from '../helpers/sample-files';

const app = createApp();
const ARTIFACTS = path.resolve(__dirname, '..', 'e2e', 'artifacts');
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const CONTACTS = {
  clientName: 'Harwell Mutual (invented)',
  adjusterName: 'Priya Castellane',
  adjusterEmail: 'priya.castellane@harwell.test',
  policyholderName: 'Odile Brennart',
  policyholderPhone: '+1 (555) 010-4477',
  accessNotes: 'Lockbox on the side gate, code from the office. One dog, friendly.',
};

describe('claim contacts on the job', () => {
  it('are kept from the job form and shown with the job', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    const created = await agent
      .post('/api/jobs')
      .send({ ...newJobBody(technician.id), ...CONTACTS, adjusterEmail: ' Priya.Castellane@harwell.test ' });
    expect(created.status).toBe(201);
    const detail = await agent.get(`/api/jobs/${created.body.job.id}`);
    expect(detail.body.contacts).toEqual({ ...CONTACTS, adjusterEmail: 'Priya.Castellane@harwell.test' });
    const cleared = await agent.patch(`/api/jobs/${created.body.job.id}`).send({ accessNotes: '' });
    expect(cleared.status).toBe(200);
    expect((await agent.get(`/api/jobs/${created.body.job.id}`)).body.contacts.accessNotes).toBeNull();
  });

  it('refuses a bad e-mail, a bad phone or a list where text belongs, naming the field, and writes nothing', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const technician = await createUser({ role: 'technician' });
    for (const [field, value] of [
      ['adjusterEmail', 'priya at harwell'],
      ['policyholderPhone', 'call me'],
      ['clientName', ['a', 'b']],
      ['accessNotes', 'x'.repeat(2001)],
    ] as const) {
      const before = await sequelize.query('SELECT COUNT(*) AS n FROM jobs', { plain: true });
      const res = await agent.post('/api/jobs').send({ ...newJobBody(technician.id), [field]: value });
      expect({ field, status: res.status }).toEqual({ field, status: 400 });
      expect(res.body.error.fields).toHaveProperty(field);
      expect(await sequelize.query('SELECT COUNT(*) AS n FROM jobs', { plain: true })).toEqual(before);
    }
  });
});

// A hand-built capture: two rooms, a split-off garage, an open gap, damage with a photo.
function deliveredRecord(photoId: number): CaptureRecord {
  return completeRecord({
    levels: [{ level: 'ground', stations: 9 }],
    rooms: [
      room({
        key: 'k',
        name: 'Kitchen',
        lengthM: feetToMetres(12),
        widthM: feetToMetres(15),
        stations: 5,
        reflective: [{ kind: 'glass_door', found: 1, flagged: 1 }],
      }),
      room({ key: 'b', name: 'Bathroom', lengthM: 2.4, widthM: 1.8, stations: 4, reflective: [{ kind: 'mirror', found: 2, flagged: 1 }] }),
    ],
    totalStations: 9,
    models: [
      { key: 'm1', structure: 'main_dwelling', structureNote: '', splitReason: null, splitNote: '', platformReference: 'MDL-4471' },
      {
        key: 'm2',
        structure: 'detached_garage',
        structureNote: '',
        splitReason: 'no_access',
        splitNote: 'No door from the house',
        platformReference: 'MDL-4472',
      },
    ],
    detachedStructures: [{ key: 'g', name: 'Garage', structure: 'detached_garage', modelKey: 'm2', noModelReason: '' }],
    gaps: [
      { key: 'g1', location: 'Bathroom ceiling', cause: 'infrared_washout', resolved: false, note: 'Skylight glare' },
      { key: 'g2', location: 'Hall closet', cause: 'contents', resolved: true, note: '' },
    ],
    damageAreas: [
      {
        key: 'd1',
        roomKey: 'k',
        description: 'Water stain under the sink',
        lossType: 'water',
        stationNumbers: [3, 4],
        photoFileIds: [photoId],
      },
    ],
    safety: { hazards: ['standing_water'], note: 'Breaker off in the kitchen' },
  });
}

async function acceptedJobWithAdjuster() {
  const technician = await createUser({ role: 'technician', name: 'Tobin Ashgrove' });
  const job = await createJob({ technicianId: technician.id });
  const photo = await createStoredFile(job.id, technician.id, { originalName: 'sink.png', sizeBytes: PNG_1X1.length });
  await photo.update({ caption: 'Swollen cabinet base under the sink' });
  await putObject(photo.storageKey, PNG_1X1, 'image/png', photo.sha256);
  const record = deliveredRecord(photo.id);
  const submittedAt = new Date();
  // Nine stations on a 1.5 m grid, analysed as an uploaded station file would be.
  const csv = [
    'station,level,x,y,unit,kind',
    ...Array.from({ length: 9 }, (_, i) => `${i + 1},ground,${(i % 3) * 1.5},${Math.floor(i / 3) * 1.5},m,station`),
  ];
  await createRevision(job, 1, record, submittedAt, analyseFor(record, csv.join('\n')));
  await job.update({
    ...CONTACTS,
    siteVisitDate: '2026-11-03',
    status: 'submitted',
    currentRevision: 1,
    cameraClass: record.cameraClass,
    submittedAt,
  });
  const { agent: reviewer, user } = await signedInAgent(app, 'reviewer');
  await claimFor(job, user.id);
  const decided = await reviewer.post(`/api/jobs/${job.id}/reviews`).send({ decision: 'accept', scores: await fullScores(record) });
  expect(decided.status).toBe(201);
  return { job, photo, reviewerName: user.name };
}

async function pdfText(buffer: Buffer, name: string) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'summary-'));
  const file = path.join(dir, 'summary.pdf');
  fs.writeFileSync(file, buffer);
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  execFileSync('pdftoppm', ['-png', '-r', '60', '-f', '1', '-l', '1', file, path.join(ARTIFACTS, name)]);
  return execFileSync('pdftotext', ['-layout', file, '-']).toString('utf8').replace(/\s+/g, ' ');
}

const bytesOf = async (key: string) => {
  const chunks: Buffer[] = [];
  for await (const chunk of await getObjectStream(key)) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
};

describe('on acceptance', () => {
  let accepted: Awaited<ReturnType<typeof acceptedJobWithAdjuster>>;
  let shareToken: string;

  beforeAll(async () => {
    accepted = await acceptedJobWithAdjuster();
    expect(await Delivery.count({ where: { jobId: accepted.job.id, status: 'pending' } })).toBe(1);
    await buildPendingSummaries();
  });

  it('builds the summary PDF with every fact, the "does not show" box included, and lists it with the files', async () => {
    const file = await StoredFile.findOne({ where: { jobId: accepted.job.id, kind: 'summary', detachedAt: null } });
    expect(file).not.toBeNull();
    const text = await pdfText(await bytesOf(file!.storageKey), 'delivery-summary-page');
    for (const fact of [
      accepted.job.claimReference,
      'Harwell Mutual (invented)',
      '1 Test Lane, Testville',
      'Water loss on 2026-11-01',
      'Site visit: 2026-11-03',
      'Technician: Tobin Ashgrove',
      'MDL-4471',
      'MDL-4472',
      'No access from the main structure: No door from the house',
      // 12 ft × 15 ft = 180 ft² = 16.7 m² (1 ft = 0.3048 m, exact by definition).
      'Kitchen: 3.66 m (12.0 ft) × 4.57 m (15.0 ft), 180 ft² (16.7 m²)',
      'Bathroom',
      '5 stations',
      'Water stain under the sink',
      'Seen from stations 3, 4',
      'Bathroom ceiling: Infrared washout on bright walls. Open',
      'Hall closet: Furniture or contents. Resolved',
      '2 mirror(s) found, 1 flagged',
      'Standing water',
      'Breaker off in the kitchen',
      `Reviewed by: ${accepted.reviewerName}`,
      'pass mark',
      'What this capture does not show',
      'Open coverage gap: Bathroom ceiling',
      'Garage is delivered as a separate model (MDL-4472)',
      'Bathroom: 1 mirror(s) not flagged',
      'Station plan',
      'it is not a survey',
      // The technician's caption names the photo.
      'Swollen cabinet base under the sink (sink.png)',
    ]) {
      expect({ fact, found: text.includes(fact) }).toEqual({ fact, found: true });
    }
    const detail = await (await signedInAgent(app, 'manager')).agent.get(`/api/jobs/${accepted.job.id}`);
    expect(detail.body.files.map((f: { kind: string }) => f.kind)).toContain('summary');
  });

  it('queues the adjuster an e-mail carrying a working share link', async () => {
    const mail = await OutboxMessage.findOne({ where: { jobId: accepted.job.id, kind: 'delivery' } });
    expect(mail!.recipients).toEqual([CONTACTS.adjusterEmail]);
    const match = /\/s\/([A-Za-z0-9_-]{43})/.exec(mail!.textBody);
    expect(match).not.toBeNull();
    shareToken = match![1];
    expect(await ShareLink.count({ where: { jobId: accepted.job.id } })).toBe(1);
    // Only the hash is stored.
    expect(await ShareLink.count({ where: { tokenHash: shareToken } })).toBe(0);
  });

  it('opens the summary for anyone with the link, records the view, and serves the PDF and the photo', async () => {
    const anonymous = clientAgent(app);
    const page = await anonymous.get(`/api/share/${shareToken}`);
    expect(page.status).toBe(200);
    expect(page.body.summary).toMatchObject({ claimReference: accepted.job.claimReference, client: CONTACTS.clientName });
    expect(page.body.summary.damage[0].photos).toEqual([
      { id: accepted.photo.id, name: 'sink.png', caption: 'Swollen cabinet base under the sink' },
    ]);
    expect(JSON.stringify(page.body)).not.toMatch(/Needs another station|comment|reviewerId|email/i);
    const pdf = await anonymous.get(`/api/share/${shareToken}/summary.pdf`).buffer(true);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect((await anonymous.get(`/api/share/${shareToken}/photos/${accepted.photo.id}`)).status).toBe(200);
    const views = await AuditEvent.findAll({ where: { jobId: accepted.job.id, type: 'share_viewed' } });
    expect(views.map((v) => (v.data as { what: string }).what).sort()).toEqual(['page', 'pdf']);
    expect((views[0].data as { address: string }).address).toMatch(/^(127\.0\.0\.0\/24|[0-9a-f:]+::\/48)$/);
  });

  it("refuses a guessed or malformed token (404), another job's photo, and a revoked or expired link (410)", async () => {
    const anonymous = clientAgent(app);
    expect((await anonymous.get(`/api/share/${'A'.repeat(43)}`)).status).toBe(404);
    expect((await anonymous.get('/api/share/short')).status).toBe(404);
    const otherJob = await createSubmittedJob();
    const other = await createStoredFile(otherJob.id, (await createUser()).id);
    expect((await anonymous.get(`/api/share/${shareToken}/photos/${other.id}`)).status).toBe(404);

    const link = (await ShareLink.findOne({ where: { jobId: accepted.job.id } }))!;
    await link.update({ expiresAt: new Date(Date.now() - 1000) });
    const expired = await anonymous.get(`/api/share/${shareToken}`);
    expect(expired.status).toBe(410);
    expect(expired.body.error.message).toMatch(/expired on \d{4}-\d{2}-\d{2}/);
    await link.update({ expiresAt: new Date(Date.now() + 86_400_000) });

    const { agent: manager } = await signedInAgent(app, 'manager');
    expect((await manager.delete(`/api/jobs/${accepted.job.id}/share-links/${link.id}`)).status).toBe(204);
    const revoked = await anonymous.get(`/api/share/${shareToken}`);
    expect(revoked.status).toBe(410);
    expect(revoked.body.error.message).toMatch(/withdrawn/);
    expect(JSON.stringify(revoked.body)).not.toContain(accepted.job.claimReference);

    // A new link works; the old one stays withdrawn.
    const issued = await manager.post(`/api/jobs/${accepted.job.id}/share-links`);
    expect(issued.status).toBe(201);
    const fresh = /\/s\/([A-Za-z0-9_-]{43})$/.exec(issued.body.url)![1];
    expect((await anonymous.get(`/api/share/${fresh}`)).status).toBe(200);
    expect((await anonymous.get(`/api/share/${shareToken}`)).status).toBe(410);
  });

  it('lets a manager rebuild the summary; the new file replaces the old in the list', async () => {
    const { agent: manager } = await signedInAgent(app, 'manager');
    const before = await StoredFile.findOne({ where: { jobId: accepted.job.id, kind: 'summary', detachedAt: null } });
    expect((await manager.post(`/api/jobs/${accepted.job.id}/summary`)).status).toBe(202);
    await buildPendingSummaries();
    const state = (await manager.get(`/api/jobs/${accepted.job.id}/delivery`)).body;
    expect(state.summaryFileId).not.toBe(before!.id);
    expect(state.deliveries[0]).toMatchObject({ status: 'built', notify: false });
    expect(await StoredFile.count({ where: { jobId: accepted.job.id, kind: 'summary', detachedAt: null } })).toBe(1);
  });

  it('rate-limits the public link per address', async () => {
    const anonymous = clientAgent(app);
    let limited = false;
    for (let i = 0; i < 130 && !limited; i++) limited = (await anonymous.get(`/api/share/${'B'.repeat(43)}`)).status === 429;
    expect(limited).toBe(true);
  });
});

describe('when storage cannot give a photo back at build time', () => {
  it('keeps the build pending with the error and builds it on a later pass', async () => {
    const { job } = await acceptedJobWithAdjuster();
    // The delivery row was written with the acceptance; a failing build leaves it pending.
    const delivery = (await Delivery.findOne({ where: { jobId: job.id } }))!;
    const photo = await StoredFile.findOne({ where: { jobId: job.id, kind: 'photo' } });
    const realKey = photo!.storageKey;
    await photo!.update({ storageKey: `jobs/${job.id}/missing-object` });
    await buildPendingSummaries();
    await delivery.reload();
    expect(delivery.status).toBe('pending');
    expect(delivery.lastError).toBeTruthy();
    await photo!.update({ storageKey: realKey });
    await delivery.update({ nextAttemptAt: new Date() });
    await buildPendingSummaries();
    await delivery.reload();
    expect(delivery.status).toBe('built');
  });
});
