import { DataTypes, type QueryInterface } from 'sequelize';

// The visit plan a technician makes at the door (one per job, a versioned draft like the
// capture record), and per camera class the kit list and visit timing a manager keeps.
// Planned and actual minutes on site are columns as well as in the plan, so the team table
// sums them in SQL.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('visit_plans', {
    job_id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    data: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    planned_minutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    actual_minutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.createTable('camera_class_settings', {
    camera_class: { type: DataTypes.STRING(20), primaryKey: true },
    kit_items: { type: DataTypes.JSON, allowNull: false },
    minutes_per_station: { type: DataTypes.DECIMAL(4, 1), allowNull: true },
    setup_minutes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    updated_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('camera_class_settings');
  await queryInterface.dropTable('visit_plans');
}
