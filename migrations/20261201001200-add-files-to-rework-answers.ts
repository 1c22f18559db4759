import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

// Files the technician attaches to an answer (e.g. a new photo of the fixed corner).
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('rework_items', 'response_file_ids', { type: DataTypes.JSON, allowNull: true });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('ALTER TABLE rework_items DROP COLUMN response_file_ids', { type: QueryTypes.RAW });
}
