import crypto from 'node:crypto';

import { createApp } from '../../server/app';
import { sequelize, StoredFile } from '../../server/models';
import { clientAgent, countRows, resetSignInLimits, signedInAgent, technicianWithJob } from '../helpers/http';
import { EXE_AS_JPG, JPEG_HEADER, PDF_MINIMAL, PNG_1X1, STATION_CSV } from '../helpers/sample-files';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');

describe('POST /api/jobs/:id/files', () => {
  it('stores a photo in object storage with its size and SHA-256', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'kitchen ceiling.png');
    expect(res.status).toBe(201);
    expect(res.body.file).toMatchObject({
      kind: 'photo',
      name: 'kitchen ceiling.png',
      contentType: 'image/png',
      sizeBytes: PNG_1X1.length,
      sha256: sha256(PNG_1X1),
    });
    const detail = await agent.get(`/api/jobs/${job.id}`);
    expect(detail.body.files.map((f: { id: number }) => f.id)).toEqual([res.body.file.id]);
  });

  it.each([
    ['photo', JPEG_HEADER, 'a.jpg', 'image/jpeg'],
    ['sketch', PDF_MINIMAL, 'plan.pdf', 'application/pdf'],
    ['sketch', PNG_1X1, 'plan.png', 'image/png'],
    ['station_coordinates', STATION_CSV, 'stations.csv', 'text/csv'],
  ])('accepts a %s whose content is %s', async (kind, buffer, name, type) => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent
      .post(`/api/jobs/${job.id}/files`)
      .field('kind', kind as string)
      .attach('file', buffer as Buffer, name as string);
    expect(res.status).toBe(201);
    expect(res.body.file.contentType).toBe(type);
  });

  it.each([
    ['an executable named .jpg', 'photo', EXE_AS_JPG, 'holiday.jpg'],
    ['a PDF offered as a photo', 'photo', PDF_MINIMAL, 'photo.jpg'],
    ['a photo offered as a coordinate file', 'station_coordinates', PNG_1X1, 'stations.csv'],
  ])('refuses %s by its content and writes nothing', async (_label, kind, buffer, name) => {
    const { agent, job } = await technicianWithJob(app);
    const before = await countRows('files');
    const res = await agent
      .post(`/api/jobs/${job.id}/files`)
      .field('kind', kind as string)
      .attach('file', buffer as Buffer, name as string);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('file');
    expect(await countRows('files')).toBe(before);
  });

  it('refuses a file over the size limit with 413', async () => {
    const { agent, job } = await technicianWithJob(app);
    const big = Buffer.concat([PNG_1X1, Buffer.alloc(26 * 1024 * 1024)]);
    const before = await countRows('files');
    const res = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', big, 'huge.png');
    expect(res.status).toBe(413);
    expect(res.body.error.fields).toEqual({ file: 'Files up to 25 MB; this one is 26 MB.' });
    expect(await countRows('files')).toBe(before);
  });

  it('asks for a file when none is sent', async () => {
    const { agent, job } = await technicianWithJob(app);
    const res = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ file: 'Choose a file to upload' });
  });
});

describe('GET /api/files/:id', () => {
  it("serves the stored bytes to the job's technician and to a reviewer, and to no one else", async () => {
    const { agent, job } = await technicianWithJob(app);
    const upload = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'p.png');
    const url = `/api/files/${upload.body.file.id}`;

    const own = await agent
      .get(url)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(own.status).toBe(200);
    expect(own.headers['content-type']).toBe('image/png');
    expect(sha256(own.body as Buffer)).toBe(sha256(PNG_1X1));

    const { agent: reviewer } = await signedInAgent(app, 'reviewer');
    expect((await reviewer.get(url)).status).toBe(200);
    const { agent: otherTechnician } = await signedInAgent(app, 'technician');
    expect((await otherTechnician.get(url)).status).toBe(404);
    expect((await clientAgent(app).get(url)).status).toBe(401);
  });
});

describe('DELETE /api/jobs/:id/files/:fileId', () => {
  it('removes the file from the working record but keeps its row for earlier revisions', async () => {
    const { agent, job } = await technicianWithJob(app);
    const upload = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'p.png');
    expect((await agent.delete(`/api/jobs/${job.id}/files/${upload.body.file.id}`)).status).toBe(204);
    expect((await agent.get(`/api/jobs/${job.id}`)).body.files).toEqual([]);
    expect((await StoredFile.findByPk(upload.body.file.id))!.detachedAt).not.toBeNull();
  });
});

describe('PATCH /api/jobs/:id/files/:fileId', () => {
  it("keeps a photo's caption, trimmed, for the job's technician only", async () => {
    const { agent, job } = await technicianWithJob(app);
    const upload = await agent.post(`/api/jobs/${job.id}/files`).field('kind', 'photo').attach('file', PNG_1X1, 'p.png');
    const res = await agent
      .patch(`/api/jobs/${job.id}/files/${upload.body.file.id}`)
      .send({ caption: ' Kitchen ceiling stain, east corner ' });
    expect(res.status).toBe(200);
    expect(res.body.file.caption).toBe('Kitchen ceiling stain, east corner');
    expect((await agent.get(`/api/jobs/${job.id}`)).body.files[0].caption).toBe('Kitchen ceiling stain, east corner');
    const { agent: other } = await signedInAgent(app, 'technician');
    expect((await other.patch(`/api/jobs/${job.id}/files/${upload.body.file.id}`).send({ caption: 'x' })).status).toBe(404);
  });
});

describe('POST /api/jobs/:id/files, a file that can never pass', () => {
  // Only the declared length is sent with a first slice of the body: the answer must come
  // back before the rest (30 MB) is ever sent.
  it('refuses a declared 30 MB upload (413, limit named) before the body is read', async () => {
    const http = await import('node:http');
    const { createJob, createUser, TEST_PASSWORD } = await import('../helpers/factories');
    const { default: request } = await import('supertest');
    const user = await createUser({ role: 'technician' });
    const job = await createJob({ technicianId: user.id });
    const signIn = await request(app)
      .post('/api/session')
      .set('x-sightline-request', '1')
      .send({ email: user.email, password: TEST_PASSWORD });
    const cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    const server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as { port: number };
    const before = await countRows('files');
    try {
      const answer = await new Promise<{ status: number; body: string; sentBytes: number }>((resolve, reject) => {
        let sentBytes = 0;
        const req = http.request({
          host: '127.0.0.1',
          port,
          method: 'POST',
          path: `/api/jobs/${job.id}/files`,
          headers: {
            cookie,
            'x-sightline-request': '1',
            'content-type': 'multipart/form-data; boundary=sightline',
            'content-length': String(30 * 1024 * 1024),
          },
        });
        req.on('response', (res) => {
          let body = '';
          res.on('data', (chunk) => (body += chunk));
          res.on('end', () => {
            req.destroy();
            resolve({ status: res.statusCode ?? 0, body, sentBytes });
          });
        });
        req.on('error', reject);
        const slice = Buffer.alloc(64 * 1024, 0x61);
        req.write(slice);
        sentBytes += slice.length;
      });
      expect(answer.status).toBe(413);
      expect(JSON.parse(answer.body).error.message).toBe('Files up to 25 MB; this one is 30 MB.');
      expect(answer.sentBytes).toBeLessThan(1024 * 1024);
      expect(await countRows('files')).toBe(before);
    } finally {
      server.close();
    }
  });
});
