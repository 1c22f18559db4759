import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

// Every sort the queue and the job list offer is served by an index, so a page reads only
// its own rows (plus the offset) and never sorts the whole queue:
// - queue_open marks the states that wait on a reviewer, so the default queue is one index range;
// - priority_rank turns the priority into a sortable number (catastrophe first);
// - technician_name is a copy of the technician's name, kept by triggers, so "sort by
//   technician" and the search need no join.
const QUEUE_INDEXES: [string, string[]][] = [
  ['jobs_queue_due', ['queue_open', 'effective_due_at', 'priority_rank', 'id']],
  ['jobs_queue_submitted', ['queue_open', 'submitted_at', 'id']],
  ['jobs_queue_claim', ['queue_open', 'claim_reference']],
  ['jobs_queue_technician_name', ['queue_open', 'technician_name', 'effective_due_at', 'id']],
  ['jobs_queue_priority', ['queue_open', 'priority_rank', 'effective_due_at', 'id']],
  ['jobs_queue_revision', ['queue_open', 'current_revision', 'effective_due_at', 'id']],
  ['jobs_queue_by_technician', ['technician_id', 'queue_open', 'effective_due_at', 'priority_rank', 'id']],
  ['jobs_status_due_order', ['status', 'effective_due_at', 'priority_rank', 'id']],
  ['jobs_list_due', ['due_at', 'id']],
  ['jobs_list_technician_name', ['technician_name', 'due_at', 'id']],
  ['jobs_list_by_technician', ['technician_id', 'due_at', 'id']],
  ['jobs_list_visit', ['site_visit_date', 'id']],
];

const TRIGGERS = {
  jobs_technician_name_insert: `CREATE TRIGGER jobs_technician_name_insert BEFORE INSERT ON jobs FOR EACH ROW
    SET NEW.technician_name = (SELECT name FROM users WHERE id = NEW.technician_id)`,
  jobs_technician_name_update: `CREATE TRIGGER jobs_technician_name_update BEFORE UPDATE ON jobs FOR EACH ROW
    IF NOT (NEW.technician_id <=> OLD.technician_id) THEN
      SET NEW.technician_name = (SELECT name FROM users WHERE id = NEW.technician_id);
    END IF`,
  users_name_to_jobs: `CREATE TRIGGER users_name_to_jobs AFTER UPDATE ON users FOR EACH ROW
    IF NOT (NEW.name <=> OLD.name) THEN
      UPDATE jobs SET technician_name = NEW.name WHERE technician_id = NEW.id;
    END IF`,
};

export async function up(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  const raw = (sql: string) => db.query(sql, { type: QueryTypes.RAW });
  await raw(`ALTER TABLE jobs
    ADD COLUMN queue_open TINYINT(1) AS (status IN ('submitted', 'in_review', 'resubmitted')) PERSISTENT,
    ADD COLUMN priority_rank TINYINT UNSIGNED AS (FIELD(priority, 'catastrophe', 'urgent', 'normal')) PERSISTENT,
    ADD COLUMN technician_name VARCHAR(120) NULL`);
  await raw('UPDATE jobs j JOIN users u ON u.id = j.technician_id SET j.technician_name = u.name');
  for (const sql of Object.values(TRIGGERS)) await raw(sql);
  await raw(
    `ALTER TABLE jobs ${QUEUE_INDEXES.map(([name, columns]) => `ADD INDEX ${name} (${columns.join(', ')})`).join(', ')},
      ADD FULLTEXT INDEX jobs_search (street, city, postcode, technician_name)`,
  );
  // Superseded by the wider indexes above.
  await raw('ALTER TABLE jobs DROP INDEX jobs_queue_order');
}

export async function down(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  const raw = (sql: string) => db.query(sql, { type: QueryTypes.RAW });
  for (const name of Object.keys(TRIGGERS)) await raw(`DROP TRIGGER IF EXISTS ${name}`);
  await raw('ALTER TABLE jobs ADD INDEX jobs_queue_order (status, effective_due_at)');
  await raw(
    `ALTER TABLE jobs ${QUEUE_INDEXES.map(([name]) => `DROP INDEX ${name}`).join(', ')}, DROP INDEX jobs_search,
      DROP COLUMN technician_name, DROP COLUMN priority_rank, DROP COLUMN queue_open`,
  );
}
