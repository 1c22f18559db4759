// The comparison for each Sightline endpoint: a bare Express route on the mariadb driver that
// returns the same rows in one query with the index that serves them best (no session, no
// ORM, no counts): what the hardware allows. For trends, the raw GROUP BY over reviews and
// scores that the rollups replace.
import express from 'express';
import { createPool } from 'mariadb';

import { looksLikeClaimReference } from '../../shared/search';

const pool = createPool({
  host: process.env.DB_HOST ?? '127.0.0.1',
  port: Number(process.env.DB_PORT ?? 3407),
  user: process.env.DB_USER ?? 'sightline',
  password: process.env.DB_PASSWORD ?? 'sightline-local',
  database: process.env.DB_NAME ?? 'sightline_bench',
  connectionLimit: 10,
  dateStrings: false,
  bigIntAsNumber: true,
  decimalAsNumber: true,
});

const QUEUE_COLUMNS = `j.id, j.claim_reference, j.property_type, j.loss_type, j.camera_class, j.current_revision, j.submitted_at,
  j.effective_due_at, j.priority, j.status, j.paused_ms, j.claim_expires_at, t.id AS technician_id, t.name AS technician_name,
  c.id AS claimed_by_id, c.name AS claimed_by_name`;
const QUEUE_JOINS = 'JOIN users t ON t.id = j.technician_id LEFT JOIN users c ON c.id = j.claimed_by_id';

const app = express();
app.get('/limit/queue', async (req, res) => {
  const page = Number(req.query.page ?? 1);
  const offset = (page - 1) * 25;
  const sql = req.query.technicianId
    ? `SELECT ${QUEUE_COLUMNS} FROM jobs j FORCE INDEX (jobs_queue_by_technician) ${QUEUE_JOINS}
       WHERE j.technician_id = ? AND j.queue_open = 1 ORDER BY j.effective_due_at, j.priority_rank, j.id LIMIT 25 OFFSET ?`
    : req.query.sort === 'technician'
      ? `SELECT ${QUEUE_COLUMNS} FROM jobs j FORCE INDEX (jobs_queue_technician_name) ${QUEUE_JOINS}
         WHERE j.queue_open = 1 ORDER BY j.technician_name, j.effective_due_at, j.id LIMIT 25 OFFSET ?`
      : `SELECT ${QUEUE_COLUMNS} FROM jobs j FORCE INDEX (jobs_queue_due) ${QUEUE_JOINS}
         WHERE j.queue_open = 1 ORDER BY j.effective_due_at, j.priority_rank, j.id LIMIT 25 OFFSET ?`;
  res.json(await pool.query(sql, req.query.technicianId ? [Number(req.query.technicianId), offset] : [offset]));
});

const JOB_COLUMNS = `j.id, j.claim_reference, j.street, j.city, j.postcode, j.property_type, j.loss_type, j.loss_date, j.site_visit_date,
  j.due_at, j.priority, j.status, t.id AS technician_id, t.name AS technician_name`;

app.get('/limit/jobs', async (req, res) => {
  if (req.query.q && looksLikeClaimReference(String(req.query.q))) {
    // A claim number: the claim-reference index alone.
    res.json(
      await pool.query(
        `SELECT ${JOB_COLUMNS} FROM jobs j JOIN users t ON t.id = j.technician_id WHERE j.claim_reference LIKE ? ORDER BY j.due_at DESC, j.id DESC LIMIT 50`,
        [`${String(req.query.q)}%`],
      ),
    );
    return;
  }
  if (req.query.q) {
    const q = String(req.query.q);
    res.json(
      await pool.query(
        `SELECT ${JOB_COLUMNS} FROM (SELECT id FROM jobs WHERE claim_reference LIKE ? UNION
           SELECT id FROM jobs WHERE MATCH(street, city, postcode, technician_name) AGAINST (? IN BOOLEAN MODE)) s
         JOIN jobs j ON j.id = s.id JOIN users t ON t.id = j.technician_id ORDER BY j.due_at DESC, j.id DESC LIMIT 50`,
        [
          `${q}%`,
          q
            .split(/[^\p{L}\p{N}]+/u)
            .filter((w) => w.length >= 3)
            .map((w) => `+${w}*`)
            .join(' ') || '+none*',
        ],
      ),
    );
    return;
  }
  res.json(
    await pool.query(
      `SELECT ${JOB_COLUMNS} FROM jobs j FORCE INDEX (jobs_list_due) JOIN users t ON t.id = j.technician_id
       ORDER BY j.due_at DESC, j.id DESC LIMIT 50 OFFSET ?`,
      [(Number(req.query.page ?? 1) - 1) * 50],
    ),
  );
});

// The raw aggregates the rollups replace, over the same period and rows.
const PRIMARY = `FROM reviews r JOIN jobs j ON j.id = r.job_id WHERE r.kind = 'primary' AND r.decided_at >= ? AND r.decided_at < ? + INTERVAL 1 DAY`;
app.get('/limit/trends/technician', async (req, res) => {
  const args = [String(req.query.from), String(req.query.to), Number(req.query.technicianId)];
  const weekly = await pool.query(
    `SELECT DATE_SUB(DATE(r.decided_at), INTERVAL WEEKDAY(r.decided_at) DAY) AS week, COUNT(*) AS reviews, AVG(r.score) AS mean_score,
       SUM(r.decision = 'rework') AS rework ${PRIMARY} AND j.technician_id = ? GROUP BY week ORDER BY week`,
    args,
  );
  const criteria = await pool.query(
    `SELECT rs.criterion_key, COUNT(*) AS n ${PRIMARY.replace('WHERE', 'JOIN review_scores rs ON rs.review_id = r.id WHERE')}
       AND j.technician_id = ? AND rs.score < rs.max_score GROUP BY rs.criterion_key`,
    args,
  );
  res.json({ weekly, criteria });
});

app.get('/limit/trends/team', async (req, res) => {
  res.json(
    await pool.query(
      `SELECT j.technician_id, COUNT(*) AS reviews, AVG(r.score) AS mean_score, SUM(r.revision_number = 1) AS first_total,
         SUM(r.revision_number = 1 AND r.decision = 'accept') AS first_accepted, SUM(r.decision = 'rework') AS rework
       ${PRIMARY} GROUP BY j.technician_id`,
      [String(req.query.from), String(req.query.to)],
    ),
  );
});

const port = Number(process.env.LIMIT_PORT ?? 8098);
app.listen(port, '127.0.0.1', () => console.log(`limit server on ${port}`));
