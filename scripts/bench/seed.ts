// A firm's volume, invented for the benchmark and labelled so: jobs in every state over three
// years, 60 technicians, 10 reviewers, about 92,000 reviews and 920,000 criterion scores
// (at scale 1). Set-based SQL over MariaDB's sequence tables (seq_1_to_N), so 100,000 jobs
// load in seconds; the trend rollups are rebuilt once at the end instead of row by row.
import bcrypt from 'bcryptjs';
import { QueryTypes, type Sequelize } from 'sequelize';

import { REBUILD_STATEMENTS } from '../../server/trends/rollup-sql';
import { DEFAULT_RUBRIC } from '../../shared/default-rubric';

export const BENCH_PASSWORD = 'sightline-bench';
export type SeedSummary = { jobs: number; waiting: number; reviews: number; scores: number; technicians: number; ms: number };

const STREETS = [
  'Alder Row',
  'Brackwater Lane',
  'Corrin Way',
  'Dunmere Close',
  'Elsby Court',
  'Fenwright Road',
  'Galloway Rise',
  'Harrow Cut',
];
const CRITERIA = DEFAULT_RUBRIC.criteria.map((c) => c.key);

// A stable pseudo-random integer in [0, m) for row n and a salt, in SQL (Knuth's multiplicative hash).
const h = (n: string, salt: number, m: number) => `CAST((((${n} + ${salt}) * 2654435761) % 4294967296) % ${m} AS SIGNED)`;

export async function seedBenchData(db: Sequelize, scale: number): Promise<SeedSummary> {
  const started = Date.now();
  const run = (sql: string, replacements: Record<string, unknown> = {}) => db.query(sql, { replacements, type: QueryTypes.RAW });
  const jobs = Math.round(100_000 * scale);
  const waiting = Math.round(6_008 * scale);
  const rework = Math.round(1_500 * scale);
  const drafts = Math.round(2_500 * scale);
  const recaptures = Math.round(400 * scale);

  await run('SET @sightline_skip_rollups = 1');
  for (const table of [
    'review_scores',
    'second_reviews',
    'rework_items',
    'reviews',
    'review_drafts',
    'audit_events',
    'capture_drafts',
    'jobs',
  ])
    await run(`DELETE FROM ${table}`);
  await run("DELETE FROM users WHERE email LIKE '%@bench.sightline.test'");
  await run('DELETE FROM rubrics');

  const hash = await bcrypt.hash(BENCH_PASSWORD, 10);
  await run(
    `INSERT INTO users (name, email, role, password_hash, active, created_at, updated_at)
     SELECT CONCAT('Bench Technician ', LPAD(seq, 2, '0')), CONCAT('tech', seq, '@bench.sightline.test'), 'technician', :hash, 1, NOW(3), NOW(3) FROM seq_1_to_60
     UNION ALL SELECT CONCAT('Bench Reviewer ', LPAD(seq, 2, '0')), CONCAT('reviewer', seq, '@bench.sightline.test'), 'reviewer', :hash, 1, NOW(3), NOW(3) FROM seq_1_to_10
     UNION ALL SELECT 'Bench Manager', 'manager@bench.sightline.test', 'manager', :hash, 1, NOW(3), NOW(3)`,
    { hash },
  );
  await run(
    `INSERT INTO rubrics (version, pass_mark, criteria, created_by_id, created_at) VALUES (1, :passMark, :criteria, NULL, NOW(3))`,
    {
      passMark: DEFAULT_RUBRIC.passMark,
      criteria: JSON.stringify(DEFAULT_RUBRIC.criteria),
    },
  );

  // Jobs 1..waiting wait for review (due around now), then rework, drafts, recaptures; the
  // rest are accepted, spread over three years.
  const streets = STREETS.map((s) => `'${s}'`).join(', ');
  await run(
    `INSERT INTO jobs (claim_reference, street, city, postcode, property_type, loss_type, loss_date, site_visit_date, due_at, priority,
       status, technician_id, created_by_id, current_revision, camera_class, submitted_at, effective_due_at, paused_ms, created_at, updated_at)
     SELECT CONCAT('BNC-', LPAD(seq, 6, '0')),
       CONCAT(1 + ${h('seq', 1, 400)}, ' ', ELT(1 + ${h('seq', 2, STREETS.length)}, ${streets})),
       'Maraskell', CONCAT('MK', LPAD(${h('seq', 3, 90)}, 2, '0')),
       ELT(1 + ${h('seq', 4, 4)}, 'single_family', 'townhouse', 'condo_unit', 'manufactured_home'),
       ELT(1 + ${h('seq', 5, 6)}, 'water', 'fire', 'smoke', 'wind', 'hail', 'other'),
       DATE(t.visit - INTERVAL 2 DAY), DATE(t.visit), t.due, ELT(1 + IF(${h('seq', 6, 10)} < 8, 0, ${h('seq', 7, 2)} + 1), 'normal', 'urgent', 'catastrophe'),
       t.status, (SELECT MIN(id) FROM users WHERE role = 'technician') + ${h('seq', 8, 60)}, NULL,
       IF(t.status = 'draft', 0, IF(t.status = 'resubmitted', 2, 1)),
       IF(t.status = 'draft', NULL, ELT(1 + ${h('seq', 9, 4)}, 'tripod_depth', 'camera_360', 'handheld_lidar', 'laser_scanner')),
       IF(t.status = 'draft', NULL, t.visit + INTERVAL 1 DAY), t.due, 0, t.visit, t.visit
     FROM (
       SELECT seq,
         CASE WHEN seq <= :waiting THEN ELT(1 + ${h('seq', 10, 6)}, 'submitted', 'submitted', 'submitted', 'submitted', 'in_review', 'resubmitted')
              WHEN seq <= :waiting + :rework THEN 'rework_requested'
              WHEN seq <= :waiting + :rework + :drafts THEN 'draft'
              WHEN seq <= :waiting + :rework + :drafts + :recaptures THEN 'recapture_required'
              ELSE 'accepted' END AS status,
         IF(seq <= :waiting + :rework + :drafts, UTC_TIMESTAMP(3) - INTERVAL ${h('seq', 11, 5 * 24 * 60)} MINUTE,
            UTC_TIMESTAMP(3) - INTERVAL (3 + ${h('seq', 12, 3 * 365 * 24)}) HOUR) AS visit,
         IF(seq <= :waiting + :rework + :drafts, UTC_TIMESTAMP(3) + INTERVAL (${h('seq', 13, 6 * 24 * 60)} - 3 * 24 * 60) MINUTE,
            UTC_TIMESTAMP(3) - INTERVAL ${h('seq', 12, 3 * 365 * 24)} HOUR) AS due
       FROM seq_1_to_${jobs}
     ) t`,
    { waiting, rework, drafts, recaptures },
  );

  // One decisive review per decided job, and a rework review before it for about one in twenty.
  const reviewerBase = "(SELECT MIN(id) FROM users WHERE role = 'reviewer')";
  const decided = `SELECT j.id, j.status, j.created_at AS visit, j.due_at FROM jobs j WHERE j.status IN ('accepted', 'recapture_required', 'rework_requested')`;
  await run(
    `INSERT INTO reviews (job_id, revision_number, reviewer_id, rubric_id, kind, score, passed, decision, claimed_at, decided_at, due_at)
     SELECT d.id, 1, ${reviewerBase} + ${h('d.id', 20, 10)}, (SELECT id FROM rubrics WHERE version = 1), 'primary',
       70 + ${h('d.id', 21, 20)}, 0, 'rework', d.visit + INTERVAL 20 HOUR, d.visit + INTERVAL 21 HOUR, d.visit + INTERVAL 30 HOUR
     FROM (${decided}) d WHERE d.status = 'rework_requested' OR ${h('d.id', 22, 20)} = 0`,
  );
  await run(
    `INSERT INTO reviews (job_id, revision_number, reviewer_id, rubric_id, kind, score, passed, decision, claimed_at, decided_at, due_at)
     SELECT d.id, IF(EXISTS (SELECT 1 FROM reviews r WHERE r.job_id = d.id), 2, 1), ${reviewerBase} + ${h('d.id', 23, 10)},
       (SELECT id FROM rubrics WHERE version = 1), 'primary',
       IF(d.status = 'accepted', 88 + ${h('d.id', 24, 13)}, 40 + ${h('d.id', 25, 30)}), d.status = 'accepted',
       IF(d.status = 'accepted', 'accept', 'recapture'),
       d.visit + INTERVAL (30 + ${h('d.id', 26, 600)}) MINUTE + INTERVAL 1 DAY,
       d.visit + INTERVAL (30 + ${h('d.id', 26, 600)} + 5 + ${h('d.id', 27, 90)}) MINUTE + INTERVAL 1 DAY,
       d.visit + INTERVAL 36 HOUR
     FROM (${decided}) d WHERE d.status <> 'rework_requested'`,
  );
  // Ten criterion scores per review: full marks mostly; short where the review was not an acceptance.
  const keys = CRITERIA.map((k, i) => `SELECT '${k}' AS criterion_key, ${i} AS n`).join(' UNION ALL ');
  const reasons = DEFAULT_RUBRIC.criteria.map(
    (c) => `WHEN '${c.key}' THEN ${c.stockReasons?.length ? `'${c.stockReasons[0].replace(/'/g, "''")}'` : 'NULL'}`,
  );
  const score = `IF(r.decision = 'accept', IF(${h('r.id * 16 + c.n', 30, 12)} = 0, 3, 4), ${h('r.id * 16 + c.n', 31, 5)})`;
  await run(
    `INSERT INTO review_scores (review_id, criterion_key, score, max_score, stock_reason, comment, carried_over)
     SELECT r.id, c.criterion_key, ${score}, 4, IF(${score} < 4, CASE c.criterion_key ${reasons.join(' ')} END, NULL),
       IF(${score} < 4, 'Bench data', ''), 0
     FROM reviews r CROSS JOIN (${keys}) c`,
  );

  await run('DELETE FROM job_state_counts');
  await run('INSERT INTO job_state_counts (status, n) SELECT status, COUNT(*) FROM jobs GROUP BY status');
  await run('SET @sightline_skip_rollups = NULL');
  for (const sql of REBUILD_STATEMENTS) await run(sql);
  await db.query('ANALYZE TABLE jobs, reviews, review_scores, users', { type: QueryTypes.SELECT });

  const count = async (sql: string) => Number(((await db.query<{ n: number }>(sql, { type: QueryTypes.SELECT }))[0] as { n: number }).n);
  return {
    jobs: await count('SELECT COUNT(*) AS n FROM jobs'),
    waiting: await count('SELECT COUNT(*) AS n FROM jobs WHERE queue_open = 1'),
    reviews: await count('SELECT COUNT(*) AS n FROM reviews'),
    scores: await count('SELECT COUNT(*) AS n FROM review_scores'),
    technicians: await count("SELECT COUNT(*) AS n FROM users WHERE role = 'technician' AND email LIKE '%@bench.sightline.test'"),
    ms: Date.now() - started,
  };
}
