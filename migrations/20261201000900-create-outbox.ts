import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

// Transactional outbox: an e-mail is a row written in the same transaction as the change
// that causes it; a worker sends it later, so nothing is lost while SMTP is down.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('outbox', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    // Stops the same message being queued twice (e.g. one reminder per rework request).
    dedupe_key: { type: DataTypes.STRING(120), allowNull: true, unique: true },
    recipients: { type: DataTypes.JSON, allowNull: false },
    subject: { type: DataTypes.STRING(200), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('pending', 'sent'), allowNull: false, defaultValue: 'pending' },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    locked_by: { type: DataTypes.STRING(64), allowNull: true },
    locked_until: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    sent_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await queryInterface.addIndex('outbox', ['status', 'next_attempt_at']);
  await queryInterface.addIndex('outbox', ['locked_by', 'locked_until']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('outbox');
}
