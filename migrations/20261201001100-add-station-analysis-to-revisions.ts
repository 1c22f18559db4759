import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

// The station-layout analysis computed by the server when a revision is submitted.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('capture_revisions', 'station_analysis', { type: DataTypes.JSON, allowNull: true });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('ALTER TABLE capture_revisions DROP COLUMN station_analysis', { type: QueryTypes.RAW });
}
