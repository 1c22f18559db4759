import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

// How many jobs are in each state, kept by triggers in the transaction of every insert,
// state change and delete, so the queue's counts and the job list's total are a read of a
// few rows instead of a count over the jobs index at every page.
const TRIGGERS = {
  jobs_state_count_insert: `CREATE TRIGGER jobs_state_count_insert AFTER INSERT ON jobs FOR EACH ROW
    INSERT INTO job_state_counts (status, n) VALUES (NEW.status, 1) ON DUPLICATE KEY UPDATE n = n + 1`,
  jobs_state_count_update: `CREATE TRIGGER jobs_state_count_update AFTER UPDATE ON jobs FOR EACH ROW
    IF NOT (NEW.status <=> OLD.status) THEN
      UPDATE job_state_counts SET n = n - 1 WHERE status = OLD.status;
      INSERT INTO job_state_counts (status, n) VALUES (NEW.status, 1) ON DUPLICATE KEY UPDATE n = n + 1;
    END IF`,
  jobs_state_count_delete: `CREATE TRIGGER jobs_state_count_delete AFTER DELETE ON jobs FOR EACH ROW
    UPDATE job_state_counts SET n = n - 1 WHERE status = OLD.status`,
};

export async function up(queryInterface: QueryInterface) {
  const raw = (sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });
  await raw('CREATE TABLE job_state_counts (status VARCHAR(40) NOT NULL PRIMARY KEY, n INT NOT NULL) ENGINE=InnoDB');
  await raw('INSERT INTO job_state_counts (status, n) SELECT status, COUNT(*) FROM jobs GROUP BY status');
  for (const sql of Object.values(TRIGGERS)) await raw(sql);
}

export async function down(queryInterface: QueryInterface) {
  const raw = (sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });
  for (const name of Object.keys(TRIGGERS)) await raw(`DROP TRIGGER IF EXISTS ${name}`);
  await raw('DROP TABLE IF EXISTS job_state_counts');
}
