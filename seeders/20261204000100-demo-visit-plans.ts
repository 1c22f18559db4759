import { type QueryInterface, QueryTypes } from 'sequelize';

import type { CaptureRecord } from '../shared/capture-record';
import type { LossType } from '../shared/jobs';
import { seededRandom } from './data/demo-jobs';
import { demoPlan } from './data/demo-plans';

// Re-runnable: a plan is added only to a demo job (claim MRK-…) that has none yet and was
// submitted at least once; its first revision shows what was planned.
export async function up(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  const rows = await db.query<{ id: number; loss_type: LossType; site_visit_date: string | Date | null; created_at: Date; data: string }>(
    `SELECT j.id, j.loss_type, j.site_visit_date, j.created_at, r.data FROM jobs j
     JOIN capture_revisions r ON r.job_id = j.id AND r.number = 1
     LEFT JOIN visit_plans v ON v.job_id = j.id
     WHERE j.claim_reference LIKE 'MRK-%' AND v.job_id IS NULL`,
    { type: QueryTypes.SELECT },
  );
  if (rows.length === 0) return;
  const rand = seededRandom(20261204);
  const plans = rows.map((row) => {
    const record = (typeof row.data === 'string' ? JSON.parse(row.data) : row.data) as CaptureRecord;
    const day = row.site_visit_date ?? row.created_at;
    const visit = (day instanceof Date ? day.toISOString() : String(day)).slice(0, 10);
    const made = demoPlan(record, row.loss_type, visit, rand);
    return {
      job_id: row.id,
      data: JSON.stringify(made.plan),
      version: 1,
      planned_minutes: made.planned,
      actual_minutes: made.actual,
      created_at: made.createdAt,
      updated_at: made.createdAt,
    };
  });
  await queryInterface.bulkInsert('visit_plans', plans);
}

export async function down(queryInterface: QueryInterface) {
  await db(queryInterface).query("DELETE v FROM visit_plans v JOIN jobs j ON j.id = v.job_id WHERE j.claim_reference LIKE 'MRK-%'");
}

const db = (queryInterface: QueryInterface) => queryInterface.sequelize;
