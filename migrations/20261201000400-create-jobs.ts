import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

import { JOB_STATUSES, LOSS_TYPES, PRIORITIES, PROPERTY_TYPES } from '../shared/jobs';

export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('jobs', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    claim_reference: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    street: { type: DataTypes.STRING(160), allowNull: false },
    city: { type: DataTypes.STRING(80), allowNull: false },
    postcode: { type: DataTypes.STRING(16), allowNull: false },
    property_type: { type: DataTypes.ENUM(...PROPERTY_TYPES), allowNull: false },
    loss_type: { type: DataTypes.ENUM(...LOSS_TYPES), allowNull: false },
    loss_date: { type: DataTypes.DATEONLY, allowNull: false },
    site_visit_date: { type: DataTypes.DATEONLY, allowNull: true },
    due_at: { type: DataTypes.DATE(3), allowNull: false },
    priority: { type: DataTypes.ENUM(...PRIORITIES), allowNull: false, defaultValue: 'normal' },
    status: { type: DataTypes.ENUM(...JOB_STATUSES), allowNull: false, defaultValue: 'draft' },
    technician_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    created_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('jobs', ['technician_id', 'status', 'due_at']);
  await queryInterface.addIndex('jobs', ['status', 'due_at']);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('jobs');
}
