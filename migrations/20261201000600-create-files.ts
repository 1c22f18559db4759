import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

import { FILE_KINDS } from '../shared/files';

// Metadata of uploaded files; the bytes live in S3-compatible storage under storage_key.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('files', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    job_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.ENUM(...FILE_KINDS), allowNull: false },
    original_name: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    size_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    storage_key: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    uploaded_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    // Removed from the working record; kept because a submitted revision may still list it.
    detached_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('files', ['job_id', 'detached_at']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('files');
}
