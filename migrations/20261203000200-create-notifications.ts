import { DataTypes, type QueryInterface } from 'sequelize';

// In-app notifications, one row per person told, and each person's e-mail choice per kind.
// Both live in MariaDB, so any instance raises, lists and marks them.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('notifications', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    job_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    text: { type: DataTypes.STRING(300), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    read_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  // A person's list, newest first, and their unread count.
  await queryInterface.addIndex('notifications', ['user_id', 'id'], { name: 'notifications_user' });
  await queryInterface.addIndex('notifications', ['user_id', 'read_at'], { name: 'notifications_user_unread' });
  await queryInterface.createTable('notification_prefs', {
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      primaryKey: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    kind: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
    email: { type: DataTypes.BOOLEAN, allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('notification_prefs');
  await queryInterface.dropTable('notifications');
}
