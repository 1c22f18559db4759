import type { QueryInterface } from 'sequelize';
import { DataTypes, QueryTypes } from 'sequelize';

// Single-use, expiring links to set a password: an invitation for a new account, or a reset.
// Only the token's SHA-256 is stored. A new account has no password until its owner sets one.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('password_tokens', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    purpose: { type: DataTypes.ENUM('invite', 'reset'), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    used_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.changeColumn('users', 'password_hash', { type: DataTypes.STRING(100), allowNull: true });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('password_tokens');
  await queryInterface.sequelize.query("UPDATE users SET password_hash = '!' WHERE password_hash IS NULL", { type: QueryTypes.UPDATE });
  await queryInterface.changeColumn('users', 'password_hash', { type: DataTypes.STRING(100), allowNull: false });
}
