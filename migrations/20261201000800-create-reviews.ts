import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

const fk = (table: string, allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model: table, key: 'id' } });
const at = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });

export async function up(queryInterface: QueryInterface) {
  // Rubric versions are immutable: editing saves a new version.
  await queryInterface.createTable('rubrics', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, unique: true },
    pass_mark: { type: DataTypes.DECIMAL(4, 1), allowNull: false },
    criteria: { type: DataTypes.JSON, allowNull: false },
    created_by_id: fk('users', true),
    created_at: at(),
  });

  await queryInterface.createTable('reviews', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    revision_number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reviewer_id: fk('users'),
    rubric_id: fk('rubrics'),
    kind: { type: DataTypes.ENUM('primary', 'blind_second'), allowNull: false, defaultValue: 'primary' },
    score: { type: DataTypes.DECIMAL(4, 1), allowNull: true },
    passed: { type: DataTypes.BOOLEAN, allowNull: false },
    decision: { type: DataTypes.ENUM('accept', 'rework', 'recapture'), allowNull: false },
    claimed_at: at(true),
    decided_at: at(),
    // The job's due time (pauses included) when the decision was made.
    due_at: at(),
  });
  await queryInterface.addIndex('reviews', ['job_id', 'revision_number']);
  await queryInterface.addIndex('reviews', ['reviewer_id', 'decided_at']);
  await queryInterface.addIndex('reviews', ['decided_at']);

  await queryInterface.createTable('review_scores', {
    review_id: { ...fk('reviews'), primaryKey: true, onDelete: 'CASCADE' },
    criterion_key: { type: DataTypes.STRING(40), primaryKey: true },
    score: { type: DataTypes.TINYINT.UNSIGNED, allowNull: true },
    stock_reason: { type: DataTypes.STRING(120), allowNull: true },
    comment: { type: DataTypes.TEXT, allowNull: true },
    carried_over: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  });
  await queryInterface.addIndex('review_scores', ['criterion_key', 'score']);

  await queryInterface.createTable('rework_items', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    review_id: { ...fk('reviews'), onDelete: 'CASCADE' },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    criterion_key: { type: DataTypes.STRING(40), allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: false },
    instruction: { type: DataTypes.TEXT, allowNull: false },
    stock_reason: { type: DataTypes.STRING(120), allowNull: true },
    response: { type: DataTypes.ENUM('fixed', 'cannot_fix', 'disputed'), allowNull: true },
    response_note: { type: DataTypes.TEXT, allowNull: true },
    responded_at: at(true),
    dispute_outcome: { type: DataTypes.ENUM('upheld', 'withdrawn'), allowNull: true },
    dispute_note: { type: DataTypes.TEXT, allowNull: true },
    dispute_decided_by_id: fk('users', true),
    dispute_decided_at: at(true),
  });
  await queryInterface.addIndex('rework_items', ['job_id']);
  await queryInterface.addIndex('rework_items', ['response', 'dispute_outcome']);

  // Accepted first reviews drawn for a blind second review (calibration).
  await queryInterface.createTable('second_reviews', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    revision_number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    first_review_id: { ...fk('reviews'), unique: true },
    first_reviewer_id: fk('users'),
    second_review_id: fk('reviews', true),
    claimed_by_id: fk('users', true),
    claim_expires_at: at(true),
    created_at: at(),
  });

  // The job timeline. Append-only: triggers refuse updates and deletes.
  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { ...fk('jobs'), onDelete: 'CASCADE' },
    actor_id: fk('users', true),
    type: { type: DataTypes.STRING(40), allowNull: false },
    data: { type: DataTypes.JSON, allowNull: false },
    created_at: at(),
  });
  await queryInterface.addIndex('audit_events', ['job_id', 'id']);
  for (const action of ['UPDATE', 'DELETE']) {
    await queryInterface.sequelize.query(
      `CREATE TRIGGER audit_events_no_${action.toLowerCase()} BEFORE ${action} ON audit_events FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Audit events are append-only'`,
    );
  }
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_update');
  await queryInterface.sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_delete');
  for (const table of ['audit_events', 'second_reviews', 'rework_items', 'review_scores', 'reviews', 'rubrics']) {
    await queryInterface.dropTable(table);
  }
}
