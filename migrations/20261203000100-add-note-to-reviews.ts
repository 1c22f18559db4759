import { DataTypes, type QueryInterface, QueryTypes } from 'sequelize';

// The reviewer's overall note to the technician, beside the per-criterion comments.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('reviews', 'note', { type: DataTypes.TEXT, allowNull: true });
}

export async function down(queryInterface: QueryInterface) {
  // Raw: the dialect's removeColumn fails on this MariaDB driver ("Cannot delete property 'meta'").
  await queryInterface.sequelize.query('ALTER TABLE reviews DROP COLUMN note', { type: QueryTypes.RAW });
}
