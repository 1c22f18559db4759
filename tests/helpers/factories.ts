import crypto from 'node:crypto';

import { CaptureDraft, CaptureRevision, Job, Review, ReworkItem, Rubric, SecondReview, StoredFile, User } from '../../server/models';
import { hashPassword } from '../../server/services/users-service';
import type { CaptureRecord } from '../../shared/capture-record';
import { emptyCaptureRecord } from '../../shared/capture-record';
import type { FileKind } from '../../shared/files';
import type { JobStatus } from '../../shared/jobs';
import type { Role } from '../../shared/roles';
import { criterionApplies, scaleMax } from '../../shared/rubric';
import type { StationAnalysis } from '../../shared/station-analysis';
import { completeRecord } from './records';

export const TEST_PASSWORD = 'correct-horse-battery';
let passwordHash: Promise<string> | undefined;

export function uniqueEmail(prefix = 'person') {
  return `${prefix}-${crypto.randomUUID().slice(0, 8)}@example.test`;
}

export async function createUser(overrides: Partial<{ role: Role; name: string; email: string; active: boolean }> = {}) {
  passwordHash ??= hashPassword(TEST_PASSWORD);
  const role = overrides.role ?? 'technician';
  return User.create({
    name: overrides.name ?? `Test ${role}`,
    email: overrides.email ?? uniqueEmail(role),
    role,
    active: overrides.active ?? true,
    passwordHash: await passwordHash,
  });
}

let jobCounter = 0;

export async function createJob(overrides: Partial<{ technicianId: number; status: JobStatus; dueAt: Date }> = {}) {
  const technicianId = overrides.technicianId ?? (await createUser({ role: 'technician' })).id;
  jobCounter += 1;
  const job = await Job.create({
    claimReference: `T-${crypto.randomUUID().slice(0, 8)}-${jobCounter}`,
    street: '1 Test Lane',
    city: 'Testville',
    postcode: 'TV-0001',
    propertyType: 'single_family',
    lossType: 'water',
    lossDate: '2026-11-01',
    siteVisitDate: '2026-11-03',
    dueAt: overrides.dueAt ?? new Date(Date.now() + 3 * 86_400_000),
    effectiveDueAt: overrides.dueAt ?? new Date(Date.now() + 3 * 86_400_000),
    currentRevision: 0,
    cameraClass: null,
    submittedAt: null,
    pausedAt: null,
    claimedById: null,
    claimedAt: null,
    claimExpiresAt: null,
    priority: 'normal',
    status: overrides.status ?? 'draft',
    technicianId,
    createdById: null,
  });
  await CaptureDraft.create({ jobId: job.id, data: emptyCaptureRecord() });
  return job;
}

// A valid POST /api/jobs body for an invented claim.
export function newJobBody(technicianId: number) {
  return {
    claimReference: `CLM-${Math.random().toString(36).slice(2, 10)}`,
    street: '22 Tessaly Row',
    city: 'Maraskell',
    postcode: 'MK-2207',
    propertyType: 'townhouse',
    lossType: 'water',
    lossDate: '2026-11-20',
    siteVisitDate: '2026-11-22',
    dueAt: new Date(Date.now() + 5 * 86_400_000).toISOString(),
    priority: 'normal',
    technicianId,
  };
}

export async function createRevision(
  job: Job,
  number: number,
  record: CaptureRecord = completeRecord(),
  submittedAt = new Date(),
  stationAnalysis: StationAnalysis | null = null,
) {
  return CaptureRevision.create({
    jobId: job.id,
    number,
    data: record,
    stationAnalysis,
    files: [],
    findings: { missing: [], warnings: [] },
    submittedById: job.technicianId,
    submittedAt,
  });
}

type ReviewOverrides = Partial<{
  revisionNumber: number;
  rubricId: number;
  kind: 'primary' | 'blind_second';
  score: number;
  claimedAt: Date | null;
  decidedAt: Date;
  dueAt: Date;
}>;

// A decided review row; `passed` follows the decision unless the score says otherwise.
export async function createReview(
  job: Job,
  reviewerId: number,
  decision: 'accept' | 'rework' | 'recapture',
  overrides: ReviewOverrides = {},
) {
  const rubricId = overrides.rubricId ?? (await Rubric.findOne({ order: [['version', 'DESC']] }))!.id;
  return Review.create({
    jobId: job.id,
    revisionNumber: overrides.revisionNumber ?? 1,
    reviewerId,
    rubricId,
    kind: overrides.kind ?? 'primary',
    score: overrides.score ?? (decision === 'accept' ? 100 : 80),
    passed: decision === 'accept',
    decision,
    claimedAt: overrides.claimedAt ?? null,
    decidedAt: overrides.decidedAt ?? new Date(),
    dueAt: overrides.dueAt ?? job.effectiveDueAt,
  });
}

export async function createStoredFile(
  jobId: number,
  uploadedById: number,
  overrides: Partial<{ kind: FileKind; originalName: string; contentType: string; sizeBytes: number }> = {},
) {
  return StoredFile.create({
    jobId,
    kind: overrides.kind ?? 'photo',
    originalName: overrides.originalName ?? 'p.png',
    contentType: overrides.contentType ?? 'image/png',
    sizeBytes: overrides.sizeBytes ?? 68,
    sha256: 'a'.repeat(64),
    storageKey: `jobs/${jobId}/test-${crypto.randomUUID()}`,
    uploadedById,
    detachedAt: null,
  });
}

// A job whose record was submitted as revision `revision` (default 1), waiting for review.
export async function createSubmittedJob(
  overrides: Partial<{
    technicianId: number;
    record: CaptureRecord;
    dueAt: Date;
    revision: number;
    priority: 'normal' | 'urgent' | 'catastrophe';
  }> = {},
) {
  const job = await createJob({ technicianId: overrides.technicianId, dueAt: overrides.dueAt });
  const record = overrides.record ?? completeRecord();
  const revision = overrides.revision ?? 1;
  const submittedAt = new Date();
  for (let n = 1; n <= revision; n++) await createRevision(job, n, record, submittedAt);
  await job.update({
    status: revision > 1 ? 'resubmitted' : 'submitted',
    currentRevision: revision,
    cameraClass: record.cameraClass,
    submittedAt,
    priority: overrides.priority ?? 'normal',
  });
  return job;
}

export async function claimFor(job: Job, reviewerId: number, minutesLeft = 30) {
  await job.update({
    claimedById: reviewerId,
    claimedAt: new Date(),
    claimExpiresAt: new Date(Date.now() + minutesLeft * 60_000),
    status: 'in_review',
  });
  return job;
}

// Full marks on every applicable criterion of the current rubric.
export async function fullScores(record: CaptureRecord = completeRecord()) {
  const rubric = await Rubric.findOne({ order: [['version', 'DESC']] });
  return rubric!.criteria.map((c) => ({
    key: c.key,
    score: criterionApplies(c, record) ? scaleMax(c.scale) : null,
    stockReason: null,
    comment: '',
  }));
}

// An accepted review by a fresh reviewer, drawn for a blind second review.
export async function secondReviewByAnother() {
  const first = await createUser({ role: 'reviewer' });
  const job = await createSubmittedJob();
  const review = await createReview(job, first.id, 'accept');
  await job.update({ status: 'accepted' });
  return SecondReview.create({
    jobId: job.id,
    revisionNumber: 1,
    firstReviewId: review.id,
    firstReviewerId: first.id,
    secondReviewId: null,
    claimedById: null,
    claimExpiresAt: null,
  });
}

// A job whose revision 1 got a rework request with one item ("coverage").
export async function reworkRequested(technicianId?: number) {
  const reviewer = await createUser({ role: 'reviewer' });
  const job = await createSubmittedJob({ technicianId });
  const review = await createReview(job, reviewer.id, 'rework');
  const item = await ReworkItem.create({
    reviewId: review.id,
    jobId: job.id,
    criterionKey: 'coverage',
    title: 'Coverage completeness',
    instruction: 'Capture the attic',
    stockReason: null,
    response: null,
    responseNote: null,
    respondedAt: null,
    disputeOutcome: null,
    disputeNote: null,
    disputeDecidedById: null,
    disputeDecidedAt: null,
  });
  await job.update({ status: 'rework_requested', pausedAt: new Date() });
  return { job, review, item, reviewer };
}
