// The raw aggregates behind each weekly trend rollup, written once: the rebuild inserts
// them, the migration fills the tables from them, and the rollup test compares with them.
// `where` narrows the rows (the test passes its own technicians); it must name columns of
// reviews r, jobs j, rubrics ru or review_scores rs.
const WEEK = 'DATE_SUB(DATE(r.decided_at), INTERVAL WEEKDAY(r.decided_at) DAY)';
const PRIMARY = `FROM reviews r JOIN jobs j ON j.id = r.job_id JOIN rubrics ru ON ru.id = r.rubric_id WHERE r.kind = 'primary'`;

export type RollupSource = { table: string; key: string[]; select: (where?: string) => string };

const and = (where?: string) => (where ? ` AND (${where})` : '');

export const ROLLUP_SOURCES: RollupSource[] = [
  {
    table: 'trend_technician_weeks',
    key: ['week', 'technician_id', 'rubric_version'],
    select: (where) => `SELECT ${WEEK} AS week, j.technician_id, ru.version AS rubric_version, COUNT(*) AS reviews,
        COALESCE(SUM(r.score), 0) AS score_sum, COUNT(r.score) AS score_n,
        SUM(r.revision_number = 1) AS first_total, SUM(r.revision_number = 1 AND r.decision = 'accept') AS first_accepted,
        SUM(r.decision = 'rework') AS rework, SUM(r.decision = 'recapture') AS recaptures,
        SUM(r.decision = 'accept') AS accepted, SUM(IF(r.decision = 'accept', r.revision_number, 0)) AS accepted_revision_sum
      ${PRIMARY}${and(where)} GROUP BY week, j.technician_id, ru.version`,
  },
  {
    table: 'trend_criterion_weeks',
    key: ['week', 'technician_id', 'rubric_version', 'criterion_key'],
    select: (where) => `SELECT ${WEEK} AS week, j.technician_id, ru.version AS rubric_version, rs.criterion_key, COUNT(*) AS below_full
      FROM reviews r JOIN jobs j ON j.id = r.job_id JOIN rubrics ru ON ru.id = r.rubric_id JOIN review_scores rs ON rs.review_id = r.id
      WHERE r.kind = 'primary' AND rs.score < rs.max_score${and(where)} GROUP BY week, j.technician_id, ru.version, rs.criterion_key`,
  },
  {
    table: 'trend_reason_weeks',
    key: ['week', 'technician_id', 'rubric_version', 'stock_reason'],
    select: (where) => `SELECT ${WEEK} AS week, j.technician_id, ru.version AS rubric_version, rs.stock_reason, COUNT(*) AS n
      FROM reviews r JOIN jobs j ON j.id = r.job_id JOIN rubrics ru ON ru.id = r.rubric_id JOIN review_scores rs ON rs.review_id = r.id
      WHERE r.kind = 'primary' AND rs.stock_reason IS NOT NULL${and(where)} GROUP BY week, j.technician_id, ru.version, rs.stock_reason`,
  },
  {
    table: 'trend_turnaround_weeks',
    key: ['week', 'technician_id', 'rubric_version', 'hours'],
    select: (where) => `SELECT ${WEEK} AS week, j.technician_id, ru.version AS rubric_version,
        TIMESTAMPDIFF(HOUR, j.site_visit_date, r.decided_at) AS hours, COUNT(*) AS n
      ${PRIMARY} AND r.decision = 'accept' AND j.site_visit_date IS NOT NULL${and(where)} GROUP BY week, j.technician_id, ru.version, hours`,
  },
  {
    table: 'trend_reviewer_weeks',
    key: ['week', 'reviewer_id'],
    select: (where) => `SELECT ${WEEK} AS week, r.reviewer_id, COUNT(*) AS reviews, COALESCE(SUM(r.decided_at > r.due_at), 0) AS late
      ${PRIMARY}${and(where)} GROUP BY week, r.reviewer_id`,
  },
  {
    table: 'trend_reviewer_minutes',
    key: ['week', 'reviewer_id', 'minutes'],
    select: (where) => `SELECT ${WEEK} AS week, r.reviewer_id, TIMESTAMPDIFF(MINUTE, r.claimed_at, r.decided_at) AS minutes, COUNT(*) AS n
      ${PRIMARY} AND r.claimed_at IS NOT NULL${and(where)} GROUP BY week, r.reviewer_id, minutes`,
  },
];

// Replaces every rollup row with the raw aggregate; run inside one transaction.
export const REBUILD_STATEMENTS = ROLLUP_SOURCES.flatMap((s) => [`DELETE FROM ${s.table}`, `INSERT INTO ${s.table} ${s.select()}`]);
