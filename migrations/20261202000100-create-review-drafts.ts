import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

// A reviewer's unfinished scores, kept per claim so a reload or another machine restores them.
// draft_key is `job:<id>` for a first review and `second:<id>` for a blind second review.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('review_drafts', {
    draft_key: { type: DataTypes.STRING(40), primaryKey: true },
    job_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    reviewer_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    revision_number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    data: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('review_drafts', ['job_id']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('review_drafts');
}
