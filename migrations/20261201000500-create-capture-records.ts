import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

// capture_drafts: the technician's working copy, autosaved. capture_revisions: what was
// submitted, frozen: a trigger refuses any UPDATE, so not even a bug can rewrite history.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('capture_drafts', {
    job_id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    data: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.createTable('capture_revisions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    data: { type: DataTypes.JSON, allowNull: false },
    files: { type: DataTypes.JSON, allowNull: false },
    findings: { type: DataTypes.JSON, allowNull: false },
    submitted_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    submitted_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('capture_revisions', ['job_id', 'number'], { unique: true });
  await queryInterface.sequelize.query(
    `CREATE TRIGGER capture_revisions_immutable BEFORE UPDATE ON capture_revisions FOR EACH ROW
     SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Capture revisions are immutable'`,
  );
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('DROP TRIGGER IF EXISTS capture_revisions_immutable');
  await queryInterface.dropTable('capture_revisions');
  await queryInterface.dropTable('capture_drafts');
}
