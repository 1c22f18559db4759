// Walks every registered API route as anonymous and as each role, and checks the answer:
// 2xx where the role is allowed, 401 for anonymous, 403 for a role that is not.
// A route missing from ROUTES fails the first test, so no route ships unchecked.
import crypto from 'node:crypto';

import type { Express } from 'express';

import { createApp } from '../../server/app';
import { CameraClassSetting, Notification, OutboxMessage, PasswordToken, sequelize } from '../../server/models';
import { putObject } from '../../server/storage/s3';
import { DEFAULT_RUBRIC } from '../../shared/default-rubric';
import { type Role, ROLES } from '../../shared/roles';
import { deliverableJob } from '../helpers/delivery';
import {
  claimFor,
  createJob,
  createRevision,
  createStoredFile,
  createSubmittedJob,
  createUser,
  fullScores,
  newJobBody,
  reworkRequested,
  secondReviewByAnother,
  TEST_PASSWORD,
} from '../helpers/factories';
import { type Agent, clientAgent, resetSignInLimits, send, signedInAgent, type Upload } from '../helpers/http';
import { housePlan } from '../helpers/plans';
import { completeRecord } from '../helpers/records';
import { registeredRoutes } from '../helpers/route-walk';
import { PNG_1X1 } from '../helpers/sample-files';

type Who = 'anonymous' | Role;
const EVERYONE: Who[] = ['anonymous', ...ROLES];

type RouteCase = {
  allowed: Who[];
  // Builds what a valid request needs (rows, ids); `me` is the signed-in user, if any.
  prepare?: (
    me: { id: number; role: Role } | null,
  ) => Promise<{ path?: string; body?: object; upload?: Upload; headers?: Record<string, string> }>;
};

const app: Express = createApp();

afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

// A new job starts with an empty draft at version 1, so its first save is based on it.
const FIRST_SAVE = { 'If-Match': '"1"' };

const ROUTES: Record<string, RouteCase> = {
  'GET /api/health': { allowed: EVERYONE },
  'POST /api/session': {
    allowed: EVERYONE,
    prepare: async () => {
      const user = await createUser();
      return { body: { email: user.email, password: TEST_PASSWORD } };
    },
  },
  'DELETE /api/session': { allowed: [...ROLES] },
  'GET /api/me': { allowed: [...ROLES] },
  'GET /api/users': { allowed: ['admin'] },
  'POST /api/users': {
    allowed: ['admin'],
    prepare: async () => ({
      body: {
        name: 'New Person',
        email: `new-${Date.now()}-${Math.random()}@example.test`.replace('0.', ''),
        role: 'reviewer',
        password: 'long-enough-password',
      },
    }),
  },
  'PATCH /api/users/:id': {
    allowed: ['admin'],
    prepare: async () => ({ path: `/api/users/${(await createUser()).id}`, body: { role: 'reviewer' } }),
  },
  'GET /api/technicians': { allowed: ['reviewer', 'manager', 'admin'] },
  'GET /api/jobs': { allowed: [...ROLES] },
  'POST /api/jobs': {
    allowed: ['manager', 'admin'],
    prepare: async () => ({ body: newJobBody((await createUser({ role: 'technician' })).id) }),
  },
  'GET /api/jobs/:id': { allowed: [...ROLES], prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}` }) },
  'PATCH /api/jobs/:id': {
    allowed: ['manager', 'admin'],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}`, body: { priority: 'urgent' } }),
  },
  'PUT /api/jobs/:id/record': {
    allowed: ['technician'],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/record`, body: completeRecord(), headers: FIRST_SAVE }),
  },
  'GET /api/jobs/:id/plan': { allowed: [...ROLES], prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/plan` }) },
  'PUT /api/jobs/:id/plan': {
    allowed: ['technician'],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/plan`, body: housePlan(), headers: { 'If-Match': '"0"' } }),
  },
  'GET /api/camera-classes': { allowed: [...ROLES] },
  'GET /api/risk-model': { allowed: [...ROLES] },
  'POST /api/risk-model/fit': { allowed: ['manager'] },
  'PUT /api/camera-classes/:cameraClass': {
    allowed: ['manager'],
    prepare: async () => {
      const row = await CameraClassSetting.findByPk('camera_360');
      return {
        path: '/api/camera-classes/camera_360',
        body: { kitItems: ['Tripod', 'Spare battery'], minutesPerStation: 1, setupMinutes: 15 },
        headers: { 'If-Match': `"${row?.version ?? 0}"` },
      };
    },
  },
  'POST /api/jobs/:id/submit': {
    allowed: ['technician'],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/submit`, body: completeRecord(), headers: FIRST_SAVE }),
  },
  'GET /api/jobs/:id/revisions/:number': {
    allowed: [...ROLES],
    prepare: async (me) => {
      const job = await jobFor(me);
      await createRevision(job, 1);
      return { path: `/api/jobs/${job.id}/revisions/1` };
    },
  },
  'POST /api/jobs/:id/files': {
    allowed: ['technician'],
    prepare: async (me) => ({
      path: `/api/jobs/${(await jobFor(me)).id}/files`,
      upload: { field: 'file', buffer: PNG_1X1, filename: 'kitchen.png', fields: { kind: 'photo' } },
    }),
  },
  'PATCH /api/jobs/:id/files/:fileId': {
    allowed: ['technician'],
    prepare: async (me) => {
      const job = await jobFor(me);
      const file = await createStoredFile(job.id, job.technicianId, { sizeBytes: PNG_1X1.length });
      return { path: `/api/jobs/${job.id}/files/${file.id}`, body: { caption: 'Porch, north side' } };
    },
  },
  'DELETE /api/jobs/:id/files/:fileId': {
    allowed: ['technician'],
    prepare: async (me) => {
      const job = await jobFor(me);
      const file = await createStoredFile(job.id, job.technicianId, { sizeBytes: PNG_1X1.length });
      return { path: `/api/jobs/${job.id}/files/${file.id}` };
    },
  },
  'GET /api/files/:id': {
    allowed: [...ROLES],
    prepare: async (me) => {
      const job = await jobFor(me);
      const file = await createStoredFile(job.id, job.technicianId, { sizeBytes: PNG_1X1.length });
      await putObject(file.storageKey, PNG_1X1, 'image/png', file.sha256);
      return { path: `/api/files/${file.id}` };
    },
  },
  'GET /api/queue': { allowed: ['reviewer', 'manager'] },
  'POST /api/queue/claim-next': { allowed: ['reviewer'] },
  'POST /api/jobs/reassign': {
    allowed: ['manager', 'admin'],
    prepare: async () => ({ body: { jobIds: [(await createJob()).id], technicianId: (await createUser({ role: 'technician' })).id } }),
  },
  'GET /api/notifications': { allowed: [...ROLES] },
  'POST /api/notifications/read-all': { allowed: [...ROLES] },
  'POST /api/notifications/:id/read': {
    allowed: [...ROLES],
    prepare: async (me) => {
      const userId = me?.id ?? (await createUser()).id;
      const row = await Notification.create({
        userId,
        jobId: null,
        kind: 'job_assigned',
        text: 'Test notice',
        createdAt: new Date(),
        readAt: null,
      });
      return { path: `/api/notifications/${row.id}/read` };
    },
  },
  'GET /api/notifications/prefs': { allowed: [...ROLES] },
  'PUT /api/notifications/prefs/:kind': {
    allowed: [...ROLES],
    prepare: async () => ({ path: '/api/notifications/prefs/job_assigned', body: { email: true } }),
  },
  'POST /api/jobs/:id/claim': {
    allowed: ['reviewer'],
    prepare: async () => ({ path: `/api/jobs/${(await createSubmittedJob()).id}/claim` }),
  },
  'DELETE /api/jobs/:id/claim': {
    allowed: ['reviewer', 'manager'],
    prepare: async (me) => {
      const reviewerId = me?.role === 'reviewer' ? me.id : (await createUser({ role: 'reviewer' })).id;
      return { path: `/api/jobs/${(await claimFor(await createSubmittedJob(), reviewerId)).id}/claim` };
    },
  },
  'POST /api/claims/reassign': {
    allowed: ['manager'],
    prepare: async () => {
      const [from, to] = [await createUser({ role: 'reviewer' }), await createUser({ role: 'reviewer' })];
      const job = await claimFor(await createSubmittedJob(), from.id);
      return { body: { toReviewerId: to.id, jobIds: [job.id] } };
    },
  },
  'GET /api/jobs/:id/workspace': {
    allowed: ['reviewer', 'manager'],
    prepare: async () => ({ path: `/api/jobs/${(await createSubmittedJob()).id}/workspace` }),
  },
  'POST /api/jobs/:id/reviews': {
    allowed: ['reviewer'],
    prepare: async (me) => {
      const job = await createSubmittedJob();
      if (me) await claimFor(job, me.id);
      return { path: `/api/jobs/${job.id}/reviews`, body: { decision: 'accept', scores: await fullScores() } };
    },
  },
  'PUT /api/jobs/:id/review-draft': {
    allowed: ['reviewer'],
    prepare: async (me) => ({
      path: `/api/jobs/${(await claimedFor(me)).id}/review-draft`,
      body: { decision: null, scores: [] },
      // No review draft exists yet: version 0.
      headers: { 'If-Match': '"0"' },
    }),
  },
  'GET /api/second-reviews': { allowed: ['reviewer'] },
  'POST /api/password/forgot': { allowed: EVERYONE, prepare: async () => ({ body: { email: 'nobody@example.test' } }) },
  'POST /api/password/reset': {
    allowed: EVERYONE,
    prepare: async () => ({ body: { token: await resetToken(), password: 'Correct horse battery 9' } }),
  },
  'PUT /api/me/password': {
    allowed: [...ROLES],
    prepare: async () => ({ body: { currentPassword: TEST_PASSWORD, newPassword: 'Gravel-lantern-owl-2026' } }),
  },
  'GET /api/outbox/failed': { allowed: ['manager', 'admin'] },
  'POST /api/outbox/:id/retry': {
    allowed: ['manager', 'admin'],
    prepare: async () => ({ path: `/api/outbox/${(await failedEmail()).id}/retry` }),
  },
  'POST /api/second-reviews/:id/claim': {
    allowed: ['reviewer'],
    prepare: async () => ({ path: `/api/second-reviews/${(await secondReviewByAnother()).id}/claim` }),
  },
  'POST /api/second-reviews/:id/reviews': {
    allowed: ['reviewer'],
    prepare: async (me) => {
      const second = await secondReviewByAnother();
      if (me) await second.update({ claimedById: me.id, claimExpiresAt: new Date(Date.now() + 30 * 60_000) });
      return { path: `/api/second-reviews/${second.id}/reviews`, body: { decision: 'accept', scores: await fullScores() } };
    },
  },
  'GET /api/reviewers': { allowed: ['manager'] },
  'GET /api/rubrics': { allowed: ['reviewer', 'manager'] },
  'GET /api/rubrics/current': { allowed: ['reviewer', 'manager'] },
  'POST /api/rubrics': { allowed: ['manager'], prepare: async () => ({ body: DEFAULT_RUBRIC }) },
  'GET /api/jobs/:id/rework-items': {
    allowed: [...ROLES],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/rework-items` }),
  },
  'PUT /api/rework-items/:id/response': {
    allowed: ['technician'],
    prepare: async (me) => {
      const { item } = await reworkRequested(me?.role === 'technician' ? me.id : undefined);
      return { path: `/api/rework-items/${item.id}/response`, body: { response: 'fixed', note: 'Added two stations' } };
    },
  },
  'GET /api/disputes': { allowed: ['manager'] },
  'PUT /api/rework-items/:id/dispute-outcome': {
    allowed: ['manager'],
    prepare: async () => {
      const { item } = await reworkRequested();
      await item.update({ response: 'disputed', responseNote: 'The attic hatch was sealed', respondedAt: new Date() });
      return { path: `/api/rework-items/${item.id}/dispute-outcome`, body: { outcome: 'withdrawn', note: 'Sealed hatch confirmed' } };
    },
  },
  'GET /api/jobs/:id/timeline': { allowed: [...ROLES], prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/timeline` }) },
  'GET /api/mailbox': { allowed: ['admin'] },
  'GET /api/trends': { allowed: ['technician', 'manager'] },
  'GET /api/trends/team': { allowed: ['manager'] },
  'GET /api/trends/reviewers': { allowed: ['manager'] },
  'GET /api/trends/calibration': { allowed: ['manager'] },
  'GET /api/jobs/:id/delivery': {
    allowed: ['manager', 'admin'],
    prepare: async (me) => ({ path: `/api/jobs/${(await deliverableJob(technicianOf(me))).job.id}/delivery` }),
  },
  'POST /api/jobs/:id/summary': {
    allowed: ['manager'],
    prepare: async (me) => ({ path: `/api/jobs/${(await deliverableJob(technicianOf(me))).job.id}/summary` }),
  },
  'POST /api/jobs/:id/share-links': {
    allowed: ['manager'],
    prepare: async (me) => ({ path: `/api/jobs/${(await deliverableJob(technicianOf(me))).job.id}/share-links` }),
  },
  'DELETE /api/jobs/:id/share-links/:linkId': {
    allowed: ['manager'],
    prepare: async (me) => {
      const { job, link } = await deliverableJob(technicianOf(me));
      return { path: `/api/jobs/${job.id}/share-links/${link.id}` };
    },
  },
  // The adjuster's view: public, for anyone holding the link.
  'GET /api/share/:token': { allowed: EVERYONE, prepare: async () => ({ path: `/api/share/${(await deliverableJob()).token}` }) },
  'GET /api/share/:token/summary.pdf': {
    allowed: EVERYONE,
    prepare: async () => ({ path: `/api/share/${(await deliverableJob()).token}/summary.pdf` }),
  },
  'GET /api/share/:token/photos/:fileId': {
    allowed: EVERYONE,
    prepare: async () => {
      const { token, photo } = await deliverableJob();
      return { path: `/api/share/${token}/photos/${photo.id}` };
    },
  },
  'GET /api/jobs/:id/station-analysis': {
    allowed: [...ROLES],
    prepare: async (me) => ({ path: `/api/jobs/${(await jobFor(me)).id}/station-analysis` }),
  },
};

// A live reset link for a fresh account (public route: anyone holding the link may use it).
async function resetToken() {
  const user = await createUser();
  const token = crypto.randomBytes(32).toString('base64url');
  await PasswordToken.create({
    userId: user.id,
    tokenHash: crypto.createHash('sha256').update(token).digest('hex'),
    purpose: 'reset',
    expiresAt: new Date(Date.now() + 3_600_000),
    usedAt: null,
  });
  return token;
}

// An e-mail that failed every attempt.
function failedEmail() {
  return OutboxMessage.create({
    jobId: null,
    kind: 'test',
    dedupeKey: null,
    recipients: ['nobody@example.test'],
    subject: 'Undeliverable',
    textBody: 't',
    htmlBody: '<p>t</p>',
    nextAttemptAt: new Date(),
    lastError: 'mailbox unavailable',
    lockedBy: null,
    lockedUntil: null,
    sentAt: null,
    status: 'failed',
    attempts: 8,
  });
}

// A claim the signed-in reviewer holds (anyone else's claim for the other roles).
async function claimedFor(me: { id: number; role: Role } | null) {
  const job = await createSubmittedJob();
  return claimFor(job, me?.role === 'reviewer' ? me.id : (await createUser({ role: 'reviewer' })).id);
}

const technicianOf = (me: { id: number; role: Role } | null) => (me?.role === 'technician' ? me.id : undefined);

// A job the signed-in technician owns (anyone else's job for the other roles).
function jobFor(me: { id: number; role: Role } | null) {
  return createJob({ technicianId: me?.role === 'technician' ? me.id : undefined });
}

describe('API route access', () => {
  it('has an access rule for every registered route, and no rule for a route that is gone', () => {
    expect(Object.keys(ROUTES).sort()).toEqual(registeredRoutes());
  });

  for (const [route, spec] of Object.entries(ROUTES)) {
    const [method, pattern] = route.split(' ');
    for (const who of EVERYONE) {
      const expected = spec.allowed.includes(who) ? '2xx' : who === 'anonymous' ? 401 : 403;
      it(`${route} as ${who} answers ${expected}`, async () => {
        let agent: Agent;
        let me: { id: number; role: Role } | null = null;
        if (who === 'anonymous') {
          agent = clientAgent(app);
        } else {
          const signed = await signedInAgent(app, who);
          agent = signed.agent;
          me = { id: signed.user.id, role: who };
        }
        const prepared = spec.prepare ? await spec.prepare(me) : {};
        const path = prepared.path ?? pattern;
        const res = await send(agent, method, path, prepared.body, prepared.upload, prepared.headers);
        if (expected === '2xx') {
          if (res.status < 200 || res.status >= 300) throw new Error(`expected 2xx, got ${res.status} ${JSON.stringify(res.body)}`);
        } else {
          expect(res.status).toBe(expected);
        }
      });
    }
  }
});
