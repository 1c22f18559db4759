import { DataTypes, type QueryInterface, QueryTypes } from 'sequelize';

// A photo's caption, typed by the technician: what it shows and where.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.addColumn('files', 'caption', { type: DataTypes.STRING(300), allowNull: true });
}

export async function down(queryInterface: QueryInterface) {
  // Raw: the dialect's removeColumn fails on this MariaDB driver ("Cannot delete property 'meta'").
  await queryInterface.sequelize.query('ALTER TABLE files DROP COLUMN caption', { type: QueryTypes.RAW });
}
