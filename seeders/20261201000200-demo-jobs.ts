import crypto from 'node:crypto';

import { type QueryInterface, QueryTypes, type Transaction } from 'sequelize';

import { analyseFor } from '../server/services/station-service';
import { putObject } from '../server/storage/s3';
import type { ClaimContacts } from '../shared/contacts';
import { DEFAULT_RUBRIC } from '../shared/default-rubric';
import { demoContacts } from './data/demo-contacts';
import { demoHistory } from './data/demo-history';
import { type DemoJob, demoJobs } from './data/demo-jobs';
import { DEMO_PEOPLE } from './data/demo-people';
import { demoStationCsv } from './data/demo-stations';

// Demo jobs that carry a station coordinate file (by position in the demo list).
const WITH_STATION_FILE = new Set([102, 108, 109, 114]);

// Re-runnable: jobs are keyed by claim reference and inserted with INSERT IGNORE; a job's
// revisions, reviews and timeline are written only when the job row was new.
export async function up(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  const users = await db.query<{ id: number; email: string }>('SELECT id, email FROM users WHERE email IN (:emails)', {
    replacements: { emails: DEMO_PEOPLE.map((p) => p.email) },
    type: QueryTypes.SELECT,
  });
  const idOf = new Map(users.map((u) => [u.email, u.id]));
  const technicians = DEMO_PEOPLE.filter((p) => p.role === 'technician').map((p) => idOf.get(p.email)!);
  const reviewers = DEMO_PEOPLE.filter((p) => p.role === 'reviewer').map((p) => idOf.get(p.email)!);
  const managerId = idOf.get(DEMO_PEOPLE.find((p) => p.role === 'manager')!.email)!;
  const [rubric] = await db.query<{ id: number }>('SELECT id FROM rubrics ORDER BY version ASC LIMIT 1', { type: QueryTypes.SELECT });
  const now = new Date();
  // The recent twelve weeks first (their positions pick station files and contacts), then two
  // years of finished history for the rework-risk model.
  const jobs = [...demoJobs(now), ...demoHistory(now)];

  const existing = await db.query<{ claim_reference: string }>('SELECT claim_reference FROM jobs WHERE claim_reference IN (:refs)', {
    replacements: { refs: jobs.map((j) => j.claimReference) },
    type: QueryTypes.SELECT,
  });
  const known = new Set(existing.map((r) => r.claim_reference));
  const fresh = jobs.filter((j) => !known.has(j.claimReference));
  if (fresh.length === 0) return;

  await db.transaction(async (transaction) => {
    for (const job of fresh) {
      const index = jobs.indexOf(job);
      await insertJob(
        queryInterface,
        transaction,
        job,
        { technicians, reviewers, managerId, rubricId: rubric.id, now },
        WITH_STATION_FILE.has(index) ? index : null,
        demoContacts(index),
      );
    }
    // The three latest acceptances get their summary and adjuster e-mail built by the worker
    // once the app runs (not under test: the test server must not write while tests count rows).
    if (process.env.NODE_ENV !== 'test') {
      await db.query(
        `INSERT INTO deliveries (job_id, notify, requested_by_id, status, attempts, next_attempt_at, created_at)
         SELECT j.id, 1, NULL, 'pending', 0, NOW(3), NOW(3) FROM jobs j
         WHERE j.status = 'accepted' AND j.claim_reference IN (:refs) ORDER BY j.id DESC LIMIT 3`,
        { replacements: { refs: fresh.map((j) => j.claimReference) }, type: QueryTypes.INSERT, transaction },
      );
    }
  });
}

type Ids = { technicians: number[]; reviewers: number[]; managerId: number; rubricId: number; now: Date };

async function insertJob(
  queryInterface: QueryInterface,
  transaction: Transaction,
  job: DemoJob,
  ids: Ids,
  stationSeed: number | null,
  contacts: ClaimContacts,
) {
  const db = queryInterface.sequelize;
  const technicianId = ids.technicians[job.technicianIndex];
  const latest = job.revisions.at(-1);
  const created = new Date(new Date(`${job.lossDate}T09:00:00Z`).getTime() + 86_400_000);
  await queryInterface.bulkInsert(
    'jobs',
    [
      {
        claim_reference: job.claimReference,
        street: job.street,
        city: job.city,
        postcode: job.postcode,
        property_type: job.propertyType,
        loss_type: job.lossType,
        loss_date: job.lossDate,
        site_visit_date: job.siteVisitDate,
        due_at: job.dueAt,
        effective_due_at: new Date(job.dueAt.getTime() + job.pausedMs),
        paused_at: job.pausedAt,
        paused_ms: job.pausedMs,
        current_revision: job.revisions.length,
        submitted_at: latest?.submittedAt ?? null,
        camera_class: latest?.record.cameraClass ?? null,
        priority: job.priority,
        status: job.status,
        technician_id: technicianId,
        created_by_id: ids.managerId,
        client_name: contacts.clientName,
        adjuster_name: contacts.adjusterName,
        adjuster_email: contacts.adjusterEmail,
        policyholder_name: contacts.policyholderName,
        policyholder_phone: contacts.policyholderPhone,
        access_notes: contacts.accessNotes,
        created_at: created,
        updated_at: ids.now,
      },
    ],
    { transaction },
  );
  const [{ id: jobId }] = await db.query<{ id: number }>('SELECT id FROM jobs WHERE claim_reference = ?', {
    replacements: [job.claimReference],
    type: QueryTypes.SELECT,
    transaction,
  });

  const events: object[] = [
    {
      job_id: jobId,
      actor_id: ids.managerId,
      type: 'created',
      data: JSON.stringify({ claimReference: job.claimReference }),
      created_at: created,
    },
    { job_id: jobId, actor_id: ids.managerId, type: 'assigned', data: JSON.stringify({ technicianId }), created_at: created },
  ];
  await queryInterface.bulkInsert(
    'capture_drafts',
    [{ job_id: jobId, data: JSON.stringify(job.draft), version: 1, created_at: created, updated_at: ids.now }],
    { transaction },
  );
  const stationFile =
    stationSeed === null
      ? null
      : await storeStationFile(queryInterface, transaction, jobId, technicianId, demoStationCsv(job.draft, stationSeed), created);
  for (const [n, revision] of job.revisions.entries()) {
    await queryInterface.bulkInsert(
      'capture_revisions',
      [
        {
          job_id: jobId,
          number: n + 1,
          data: JSON.stringify(revision.record),
          files: JSON.stringify(stationFile ? [stationFile.view] : []),
          findings: JSON.stringify({ missing: [], warnings: [] }),
          submitted_by_id: technicianId,
          submitted_at: revision.submittedAt,
          station_analysis: stationFile ? JSON.stringify(analyseFor(revision.record, stationFile.text)) : null,
        },
      ],
      { transaction },
    );
    events.push({
      job_id: jobId,
      actor_id: technicianId,
      type: 'submitted',
      data: JSON.stringify({ revision: n + 1, warnings: 0 }),
      created_at: revision.submittedAt,
    });
  }

  let firstAcceptedId: number | null = null;
  for (const review of job.reviews) {
    const reviewerId = ids.reviewers[review.reviewerIndex];
    await queryInterface.bulkInsert(
      'reviews',
      [
        {
          job_id: jobId,
          revision_number: review.revision,
          reviewer_id: reviewerId,
          rubric_id: ids.rubricId,
          kind: review.kind,
          score: review.score,
          passed: review.passed,
          decision: review.decision,
          claimed_at: review.claimedAt,
          decided_at: review.decidedAt,
          due_at: job.dueAt,
        },
      ],
      { transaction },
    );
    const [{ id: reviewId }] = await db.query<{ id: number }>('SELECT LAST_INSERT_ID() AS id', { type: QueryTypes.SELECT, transaction });
    await queryInterface.bulkInsert(
      'review_scores',
      review.scores.map((s) => ({
        review_id: reviewId,
        criterion_key: s.key,
        score: s.score,
        max_score: s.maxScore,
        stock_reason: s.stockReason,
        comment: s.comment,
        carried_over: false,
      })),
      { transaction },
    );
    if (review.kind === 'primary') {
      events.push({
        job_id: jobId,
        actor_id: reviewerId,
        type: 'reviewed',
        data: JSON.stringify({
          decision: review.decision,
          score: review.score,
          passed: review.passed,
          rubricVersion: 1,
          revision: review.revision,
        }),
        created_at: review.decidedAt,
      });
      if (review.decision === 'accept') firstAcceptedId = reviewId;
      if (review.decision === 'rework') {
        const failing = review.scores.filter((s) => s.score !== null && s.score < s.maxScore);
        const answered = job.revisions.length > review.revision;
        await queryInterface.bulkInsert(
          'rework_items',
          failing.map((s) => ({
            review_id: reviewId,
            job_id: jobId,
            criterion_key: s.key,
            title: DEFAULT_RUBRIC.criteria.find((c) => c.key === s.key)!.title,
            instruction: s.comment ?? '',
            stock_reason: s.stockReason,
            response: answered ? 'fixed' : null,
            response_note: answered ? 'Corrected on the next revision (demo).' : null,
            responded_at: answered ? job.revisions[review.revision].submittedAt : null,
          })),
          { transaction },
        );
      }
    } else if (firstAcceptedId !== null) {
      const firstReviewerIndex = (review.reviewerIndex + 2) % 3;
      await queryInterface.bulkInsert(
        'second_reviews',
        [
          {
            job_id: jobId,
            revision_number: review.revision,
            first_review_id: firstAcceptedId,
            first_reviewer_id: ids.reviewers[firstReviewerIndex],
            second_review_id: reviewId,
            created_at: review.decidedAt,
          },
        ],
        { transaction },
      );
    }
  }
  await queryInterface.bulkInsert('audit_events', events, { transaction });
}

// Puts the demo station file in object storage and records it. Without storage (the fake S3
// not running) the job simply has no station file.
async function storeStationFile(
  queryInterface: QueryInterface,
  transaction: Transaction,
  jobId: number,
  technicianId: number,
  text: string,
  at: Date,
) {
  const buffer = Buffer.from(text);
  const sha256 = crypto.createHash('sha256').update(buffer).digest('hex');
  const storageKey = `jobs/${jobId}/demo-stations-${sha256.slice(0, 12)}`;
  try {
    await putObject(storageKey, buffer, 'text/csv', sha256);
  } catch {
    console.warn(`demo station file for job ${jobId} not stored: object storage unreachable`);
    return null;
  }
  await queryInterface.bulkInsert(
    'files',
    [
      {
        job_id: jobId,
        kind: 'station_coordinates',
        original_name: 'stations.csv',
        content_type: 'text/csv',
        size_bytes: buffer.length,
        sha256,
        storage_key: storageKey,
        uploaded_by_id: technicianId,
        detached_at: null,
        created_at: at,
      },
    ],
    { transaction },
  );
  const [{ id }] = await queryInterface.sequelize.query<{ id: number }>('SELECT LAST_INSERT_ID() AS id', {
    type: QueryTypes.SELECT,
    transaction,
  });
  const view = {
    id,
    kind: 'station_coordinates',
    name: 'stations.csv',
    contentType: 'text/csv',
    sizeBytes: buffer.length,
    sha256,
    uploadedAt: at.toISOString(),
  };
  return { text, view };
}

export async function down(queryInterface: QueryInterface) {
  const refs = [...demoJobs(), ...demoHistory()].map((j) => j.claimReference);
  await queryInterface.sequelize.query('DELETE FROM jobs WHERE claim_reference IN (:refs)', {
    replacements: { refs },
    type: QueryTypes.DELETE,
  });
}
