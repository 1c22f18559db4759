import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

// Delivery to the adjuster: the claim's contacts on the job, the acceptance summary (a PDF
// stored with the job's files), read-only share links (only a hash of each token is kept),
// and a queue of summaries to build, written in the acceptance's own transaction so an
// object-storage outage delays a delivery and never loses it.
export async function up(queryInterface: QueryInterface) {
  const text = (length: number) => ({ type: DataTypes.STRING(length), allowNull: true });
  await queryInterface.addColumn('jobs', 'client_name', text(120));
  await queryInterface.addColumn('jobs', 'adjuster_name', text(120));
  await queryInterface.addColumn('jobs', 'adjuster_email', text(254));
  await queryInterface.addColumn('jobs', 'policyholder_name', text(120));
  await queryInterface.addColumn('jobs', 'policyholder_phone', text(40));
  await queryInterface.addColumn('jobs', 'access_notes', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.sequelize.query("ALTER TABLE files MODIFY kind ENUM('photo', 'sketch', 'station_coordinates', 'summary') NOT NULL", {
    type: QueryTypes.RAW,
  });

  const fk = (table: string, allowNull = false) => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model: table, key: 'id' },
  });
  await queryInterface.createTable('share_links', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    created_by_id: fk('users', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await queryInterface.addIndex('share_links', ['job_id']);

  await queryInterface.createTable('deliveries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    // Send the adjuster the link once built (on acceptance), or only rebuild the file (on demand).
    notify: { type: DataTypes.BOOLEAN, allowNull: false },
    requested_by_id: fk('users', true),
    status: { type: DataTypes.ENUM('pending', 'built', 'failed'), allowNull: false, defaultValue: 'pending' },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    locked_by: { type: DataTypes.STRING(64), allowNull: true },
    locked_until: { type: DataTypes.DATE(3), allowNull: true },
    file_id: fk('files', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    built_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await queryInterface.addIndex('deliveries', ['status', 'next_attempt_at']);
  await queryInterface.addIndex('deliveries', ['job_id']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('deliveries');
  await queryInterface.dropTable('share_links');
  await queryInterface.sequelize.query("DELETE FROM files WHERE kind = 'summary'", { type: QueryTypes.DELETE });
  await queryInterface.sequelize.query("ALTER TABLE files MODIFY kind ENUM('photo', 'sketch', 'station_coordinates') NOT NULL", {
    type: QueryTypes.RAW,
  });
  const columns = ['access_notes', 'policyholder_phone', 'policyholder_name', 'adjuster_email', 'adjuster_name', 'client_name'];
  await queryInterface.sequelize.query(`ALTER TABLE jobs ${columns.map((c) => `DROP COLUMN ${c}`).join(', ')}`, { type: QueryTypes.RAW });
}
