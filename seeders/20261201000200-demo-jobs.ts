import { QueryTypes, type QueryInterface } from 'sequelize';
import { DEMO_PEOPLE } from './data/demo-people';
import { demoJobs } from './data/demo-jobs';

// Re-runnable: rows are keyed by claim reference (jobs), job (drafts) and job + number
// (revisions), and inserted with INSERT IGNORE, so a second run adds nothing.
export async function up(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  const technicians = DEMO_PEOPLE.filter((p) => p.role === 'technician');
  const users = await db.query<{ id: number; email: string }>('SELECT id, email FROM users WHERE email IN (:emails)', {
    replacements: { emails: DEMO_PEOPLE.map((p) => p.email) },
    type: QueryTypes.SELECT,
  });
  const idOf = new Map(users.map((u) => [u.email, u.id]));
  const manager = DEMO_PEOPLE.find((p) => p.role === 'manager')!;
  const now = new Date();
  const jobs = demoJobs(now);

  await queryInterface.bulkInsert(
    'jobs',
    jobs.map((j) => ({
      claim_reference: j.claimReference,
      street: j.street,
      city: j.city,
      postcode: j.postcode,
      property_type: j.propertyType,
      loss_type: j.lossType,
      loss_date: j.lossDate,
      site_visit_date: j.siteVisitDate,
      due_at: j.dueAt,
      effective_due_at: j.dueAt,
      current_revision: j.revisions.length,
      submitted_at: j.revisions.at(-1)?.submittedAt ?? null,
      camera_class: j.revisions.at(-1)?.record.cameraClass ?? null,
      priority: j.priority,
      status: j.status,
      technician_id: idOf.get(technicians[j.technicianIndex].email),
      created_by_id: idOf.get(manager.email),
      created_at: new Date(new Date(j.lossDate).getTime() + 86_400_000),
      updated_at: now,
    })),
    { ignoreDuplicates: true } as object,
  );

  const rows = await db.query<{ id: number; claim_reference: string }>('SELECT id, claim_reference FROM jobs WHERE claim_reference IN (:refs)', {
    replacements: { refs: jobs.map((j) => j.claimReference) },
    type: QueryTypes.SELECT,
  });
  const jobId = new Map(rows.map((r) => [r.claim_reference, r.id]));

  await queryInterface.bulkInsert(
    'capture_drafts',
    jobs.map((j) => ({ job_id: jobId.get(j.claimReference), data: JSON.stringify(j.draft), version: 1, created_at: now, updated_at: now })),
    { ignoreDuplicates: true } as object,
  );

  const revisions = jobs.flatMap((j) =>
    j.revisions.map((r, n) => ({
      job_id: jobId.get(j.claimReference),
      number: n + 1,
      data: JSON.stringify(r.record),
      files: '[]',
      findings: JSON.stringify({ missing: [], warnings: [] }),
      submitted_by_id: idOf.get(technicians[j.technicianIndex].email),
      submitted_at: r.submittedAt,
    })),
  );
  if (revisions.length) await queryInterface.bulkInsert('capture_revisions', revisions, { ignoreDuplicates: true } as object);
}

export async function down(queryInterface: QueryInterface) {
  const refs = demoJobs().map((j) => j.claimReference);
  await queryInterface.sequelize.query(
    'DELETE FROM jobs WHERE claim_reference IN (:refs)',
    { replacements: { refs }, type: QueryTypes.DELETE },
  );
}
