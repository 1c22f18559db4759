import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

import { CAMERA_CLASSES } from '../shared/capture-record';

// Review state kept on the job row so the queue filters and sorts with indexed columns:
// the current revision, its camera class and submission time, the due time shifted by the
// time spent waiting on the technician (the due clock pauses during rework), and the claim.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('jobs', 'current_revision', { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
  await queryInterface.addColumn('jobs', 'camera_class', { type: DataTypes.ENUM(...CAMERA_CLASSES), allowNull: true });
  await queryInterface.addColumn('jobs', 'submitted_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('jobs', 'effective_due_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('jobs', 'paused_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('jobs', 'paused_ms', { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 });
  await queryInterface.addColumn('jobs', 'claimed_by_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
  });
  await queryInterface.addColumn('jobs', 'claimed_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('jobs', 'claim_expires_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.sequelize.query(
    `UPDATE jobs j LEFT JOIN (
      SELECT job_id, MAX(number) AS n FROM capture_revisions GROUP BY job_id
    ) latest ON latest.job_id = j.id
    LEFT JOIN capture_revisions r ON r.job_id = j.id AND r.number = latest.n
    SET j.effective_due_at = j.due_at,
        j.current_revision = COALESCE(latest.n, 0),
        j.submitted_at = r.submitted_at,
        j.camera_class = JSON_UNQUOTE(JSON_EXTRACT(r.data, '$.cameraClass'))`,
    { type: QueryTypes.UPDATE },
  );
  await queryInterface.changeColumn('jobs', 'effective_due_at', { type: DataTypes.DATE(3), allowNull: false });
  await queryInterface.addIndex('jobs', ['status', 'effective_due_at'], { name: 'jobs_queue_order' });
  await queryInterface.addIndex('jobs', ['claimed_by_id']);
}

// Raw ALTERs: Sequelize's removeColumn runs an untyped SELECT that the mariadb 3 driver breaks.
export async function down(queryInterface: QueryInterface) {
  const db = queryInterface.sequelize;
  await queryInterface.removeIndex('jobs', 'jobs_queue_order');
  const keys = await db.query<{ name: string }>(
    "SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'jobs' AND COLUMN_NAME = 'claimed_by_id' AND REFERENCED_TABLE_NAME IS NOT NULL",
    { type: QueryTypes.SELECT },
  );
  for (const key of keys) await db.query(`ALTER TABLE jobs DROP FOREIGN KEY \`${key.name}\``, { type: QueryTypes.RAW });
  const columns = [
    'claim_expires_at',
    'claimed_at',
    'claimed_by_id',
    'paused_ms',
    'paused_at',
    'effective_due_at',
    'submitted_at',
    'camera_class',
    'current_revision',
  ];
  await db.query(`ALTER TABLE jobs ${columns.map((c) => `DROP COLUMN ${c}`).join(', ')}`, { type: QueryTypes.RAW });
}
