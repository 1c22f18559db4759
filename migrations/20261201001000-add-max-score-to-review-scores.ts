import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

// The top of the criterion's scale when it was scored (4 for levels, 1 for pass/fail), so
// trends can count "below full marks" and build agreement tables in SQL.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('review_scores', 'max_score', { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 4 });
  await queryInterface.addIndex('review_scores', ['criterion_key', 'max_score', 'score']);
}

export async function down(queryInterface: QueryInterface) {
  // Raw ALTER: removeColumn's own look-up query breaks with the mariadb 3 driver.
  await queryInterface.sequelize.query(
    'ALTER TABLE review_scores DROP INDEX review_scores_criterion_key_max_score_score, DROP COLUMN max_score',
    { type: QueryTypes.RAW },
  );
}
