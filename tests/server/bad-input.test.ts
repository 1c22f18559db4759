// Every write route refuses malformed input with 400, names the fields, and writes nothing.
// A write route missing from CASES fails the first test.
import { createApp } from '../../server/app';
import { sequelize } from '../../server/models';
import type { Role } from '../../shared/roles';
import { claimFor, createJob, createSubmittedJob, createUser, reworkRequested, secondReviewByAnother } from '../helpers/factories';
import { type Agent, countRows, resetSignInLimits, send, signedInAgent, type Upload } from '../helpers/http';
import { housePlan } from '../helpers/plans';
import { completeRecord } from '../helpers/records';
import { registeredRoutes } from '../helpers/route-walk';
import { PNG_1X1 } from '../helpers/sample-files';

type BadInputCase = {
  as: Role | 'anonymous';
  // Tables whose row counts must not change.
  tables: string[];
  prepare?: (me: { id: number }) => Promise<{ path?: string }>;
  body: object;
  upload?: Upload;
  headers?: Record<string, string>;
  fields: string[];
};

// Routes that take no input at all.
const NO_INPUT = [
  'POST /api/risk-model/fit',
  'POST /api/notifications/read-all',
  'DELETE /api/session',
  'DELETE /api/jobs/:id/claim',
  'POST /api/jobs/:id/summary',
  'POST /api/jobs/:id/share-links',
];

const CASES: Record<string, BadInputCase> = {
  'POST /api/session': { as: 'anonymous', tables: ['sessions'], body: { email: 'no', password: '' }, fields: ['email', 'password'] },
  'POST /api/users': {
    as: 'admin',
    tables: ['users'],
    body: { name: '', email: 'x@', role: 'chief' },
    fields: ['email', 'name', 'role'],
  },
  'PATCH /api/users/:id': {
    as: 'admin',
    tables: ['users'],
    prepare: async () => ({ path: `/api/users/${(await createUser()).id}` }),
    body: { role: 'chief', active: 'yes' },
    fields: ['active', 'role'],
  },
  'POST /api/jobs': {
    as: 'manager',
    tables: ['jobs', 'capture_drafts'],
    body: {
      claimReference: 'x',
      street: '',
      city: 'B',
      postcode: '',
      propertyType: 'castle',
      lossType: 'flood',
      lossDate: '2099-01-01',
      siteVisitDate: '11/02/2026',
      dueAt: 'soon',
      priority: 'asap',
      technicianId: 'tess',
      adjusterEmail: 'adjuster at carrier',
      policyholderPhone: 'ring twice',
      clientName: ['a list'],
    },
    fields: [
      'adjusterEmail',
      'city',
      'claimReference',
      'clientName',
      'dueAt',
      'lossDate',
      'lossType',
      'policyholderPhone',
      'postcode',
      'priority',
      'propertyType',
      'siteVisitDate',
      'street',
      'technicianId',
    ],
  },
  'PATCH /api/jobs/:id': {
    as: 'manager',
    tables: ['jobs'],
    prepare: async () => ({ path: `/api/jobs/${(await createJob()).id}` }),
    body: { priority: 'whenever', dueAt: 'tomorrow-ish' },
    fields: ['dueAt', 'priority'],
  },
  'DELETE /api/jobs/:id/share-links/:linkId': {
    as: 'manager',
    tables: ['share_links'],
    prepare: async () => ({ path: `/api/jobs/${(await createJob()).id}/share-links/first` }),
    body: {},
    fields: ['linkId'],
  },
  'PUT /api/jobs/:id/record': {
    as: 'technician',
    tables: ['capture_drafts', 'capture_revisions'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/record` }),
    headers: { 'If-Match': '"1"' },
    body: badRecord(),
    fields: ['cameraClass', 'exteriorStations', 'rooms.0.reflective.0', 'rooms.0.stations', 'units'],
  },
  'PUT /api/jobs/:id/plan': {
    as: 'technician',
    tables: ['visit_plans'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/plan` }),
    headers: { 'If-Match': '"0"' },
    body: {
      ...housePlan(),
      cameraClass: 'pinhole',
      structures: [{ ...housePlan().structures[0], kind: 'castle', inScope: 'yes' }],
      rooms: [{ ...housePlan().rooms[0], lengthM: -3 }],
      hazards: ['dragons'],
      units: ['ft'],
    },
    fields: ['cameraClass', 'hazards.0', 'rooms.0.lengthM', 'structures.0.inScope', 'structures.0.kind', 'units'],
  },
  'PUT /api/camera-classes/:cameraClass': {
    as: 'manager',
    tables: ['camera_class_settings'],
    prepare: async () => ({ path: '/api/camera-classes/tripod_depth' }),
    headers: { 'If-Match': '"0"' },
    body: { kitItems: ['Tripod', ''], minutesPerStation: 'quick', setupMinutes: -5 },
    fields: ['kitItems.1', 'minutesPerStation', 'setupMinutes'],
  },
  'POST /api/jobs/:id/submit': {
    as: 'technician',
    tables: ['capture_revisions'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/submit` }),
    headers: { 'If-Match': '"1"' },
    body: badRecord(),
    fields: ['cameraClass', 'exteriorStations', 'rooms.0.reflective.0', 'rooms.0.stations', 'units'],
  },
  'PUT /api/jobs/:id/review-draft': {
    as: 'reviewer',
    tables: ['review_drafts'],
    prepare: async (me) => ({ path: `/api/jobs/${(await claimFor(await createSubmittedJob(), me.id)).id}/review-draft` }),
    headers: { 'If-Match': '"0"' },
    body: { decision: 'maybe', scores: 'all fine' },
    fields: ['decision', 'scores'],
  },
  'POST /api/outbox/:id/retry': {
    as: 'manager',
    tables: ['outbox'],
    prepare: async () => ({ path: '/api/outbox/not-a-number/retry' }),
    body: {},
    fields: ['id'],
  },
  'POST /api/password/forgot': {
    as: 'anonymous',
    tables: ['password_tokens', 'outbox'],
    body: { email: 'not-an-address' },
    fields: ['email'],
  },
  'POST /api/password/reset': {
    as: 'anonymous',
    tables: ['users', 'password_tokens'],
    body: { token: 7, password: ['x'] },
    fields: ['password', 'token'],
  },
  'PUT /api/me/password': {
    as: 'technician',
    tables: ['users'],
    body: { currentPassword: '', newPassword: 42 },
    fields: ['currentPassword', 'newPassword'],
  },
  'POST /api/jobs/:id/files': {
    as: 'technician',
    tables: ['files'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/files` }),
    body: {},
    upload: { field: 'file', buffer: PNG_1X1, filename: 'a.png', fields: { kind: 'selfie' } },
    fields: ['kind'],
  },
  'PATCH /api/jobs/:id/files/:fileId': {
    as: 'technician',
    tables: ['files'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/files/first` }),
    body: { caption: ['not', 'text'] },
    fields: ['caption', 'fileId'],
  },
  'DELETE /api/jobs/:id/files/:fileId': {
    as: 'technician',
    tables: ['files'],
    prepare: async (me) => ({ path: `/api/jobs/${(await createJob({ technicianId: me.id })).id}/files/first` }),
    body: {},
    fields: ['fileId'],
  },
  'POST /api/jobs/:id/claim': {
    as: 'reviewer',
    tables: ['audit_events'],
    prepare: async () => ({ path: '/api/jobs/not-a-job/claim' }),
    body: {},
    fields: ['id'],
  },
  'POST /api/claims/reassign': {
    as: 'manager',
    tables: ['audit_events'],
    body: { toReviewerId: 'ravi', jobIds: ['x'] },
    fields: ['jobIds.0', 'toReviewerId'],
  },
  'POST /api/jobs/:id/reviews': {
    as: 'reviewer',
    tables: ['reviews', 'review_scores'],
    prepare: async (me) => ({ path: `/api/jobs/${(await claimFor(await createSubmittedJob(), me.id)).id}/reviews` }),
    body: { decision: 'shrug', scores: [{ key: 'coverage', score: 9, comment: 5 }], note: { text: 'x' } },
    fields: ['decision', 'note', 'scores.0.comment', 'scores.0.score'],
  },
  'POST /api/jobs/reassign': {
    as: 'manager',
    tables: ['audit_events', 'notifications'],
    body: { jobIds: 'all of them', technicianId: { id: 1 } },
    fields: ['jobIds', 'technicianId'],
  },
  'POST /api/notifications/:id/read': {
    as: 'technician',
    tables: ['notifications'],
    prepare: async () => ({ path: '/api/notifications/first/read' }),
    body: {},
    fields: ['id'],
  },
  'PUT /api/notifications/prefs/:kind': {
    as: 'technician',
    tables: ['notification_prefs'],
    prepare: async () => ({ path: '/api/notifications/prefs/everything' }),
    body: { email: [true] },
    fields: ['email', 'kind'],
  },
  // Its input is the queue filter in the query string; a claim would write a timeline event.
  'POST /api/queue/claim-next': {
    as: 'reviewer',
    tables: ['audit_events'],
    prepare: async () => ({ path: '/api/queue/claim-next?sort=nonsense&claimedByMe=maybe&status=lost' }),
    body: {},
    fields: ['claimedByMe', 'sort', 'status'],
  },
  'POST /api/second-reviews/:id/claim': {
    as: 'reviewer',
    tables: ['second_reviews'],
    prepare: async () => ({ path: '/api/second-reviews/latest/claim' }),
    body: {},
    fields: ['id'],
  },
  'POST /api/second-reviews/:id/reviews': {
    as: 'reviewer',
    tables: ['reviews'],
    prepare: async () => ({ path: `/api/second-reviews/${(await secondReviewByAnother()).id}/reviews` }),
    body: { decision: 'accept', scores: 'all good' },
    fields: ['scores'],
  },
  'POST /api/rubrics': {
    as: 'manager',
    tables: ['rubrics'],
    body: {
      passMark: 120,
      criteria: [
        {
          key: 'Bad Key',
          title: 'x',
          guidance: '',
          weight: 0,
          critical: 'no',
          appliesWhen: 'sometimes',
          scale: { kind: 'stars' },
          stockReasons: [],
        },
      ],
    },
    fields: [
      'criteria',
      'criteria.0.appliesWhen',
      'criteria.0.critical',
      'criteria.0.key',
      'criteria.0.scale.kind',
      'criteria.0.title',
      'criteria.0.weight',
      'passMark',
    ],
  },
  'PUT /api/rework-items/:id/response': {
    as: 'technician',
    tables: ['audit_events'],
    prepare: async (me) => ({ path: `/api/rework-items/${(await reworkRequested(me.id)).item.id}/response` }),
    body: { response: 'shrug', note: 7 },
    fields: ['note', 'response'],
  },
  'PUT /api/rework-items/:id/dispute-outcome': {
    as: 'manager',
    tables: ['audit_events'],
    prepare: async () => ({ path: `/api/rework-items/${(await reworkRequested()).item.id}/dispute-outcome` }),
    body: { outcome: 'maybe' },
    fields: ['note', 'outcome'],
  },
};

// Wrong unit, unknown camera class, negative and oversized counts, more flagged than found.
function badRecord() {
  return {
    ...completeRecord(),
    units: 'cubits',
    cameraClass: 'pinhole',
    exteriorStations: -2,
    rooms: [{ ...completeRecord().rooms[0], stations: 9999, reflective: [{ kind: 'mirror', found: 1, flagged: 3 }] }],
  };
}

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('bad input on write routes', () => {
  it('has a case for every write route', () => {
    const writes = registeredRoutes().filter((r) => !r.startsWith('GET ') && !NO_INPUT.includes(r));
    expect(Object.keys(CASES).sort()).toEqual(writes);
  });

  for (const [route, spec] of Object.entries(CASES)) {
    const [method, pattern] = route.split(' ');
    it(`${route} answers 400 naming ${spec.fields.join(', ')} and writes nothing`, async () => {
      const { default: request } = await import('supertest');
      const signed = spec.as === 'anonymous' ? null : await signedInAgent(app, spec.as);
      const agent = signed?.agent ?? request.agent(app).set('x-sightline-request', '1');
      const path = (spec.prepare && signed ? (await spec.prepare(signed.user)).path : undefined) ?? pattern;
      const before = await Promise.all(spec.tables.map(countRows));
      const res = await send(agent as Agent, method, path, spec.body, spec.upload, spec.headers);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields).sort()).toEqual(spec.fields);
      expect(await Promise.all(spec.tables.map(countRows))).toEqual(before);
    });
  }
});
