import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    expires: { type: DataTypes.DATE(3), allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('sessions', ['expires']);
  await queryInterface.addIndex('sessions', ['user_id']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('sessions');
}
