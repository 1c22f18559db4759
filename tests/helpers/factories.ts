import crypto from 'node:crypto';
import type { Role } from '../../shared/roles';
import { CaptureDraft, Job, User } from '../../server/models';
import { emptyCaptureRecord } from '../../shared/capture-record';
import type { JobStatus } from '../../shared/jobs';
import { hashPassword } from '../../server/services/users-service';

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
    street: '22 Larkspur Row', city: 'Brambleford', postcode: 'BF-2207',
    propertyType: 'townhouse', lossType: 'water', lossDate: '2026-11-20', siteVisitDate: '2026-11-22',
    dueAt: new Date(Date.now() + 5 * 86_400_000).toISOString(), priority: 'normal', technicianId,
  };
}
