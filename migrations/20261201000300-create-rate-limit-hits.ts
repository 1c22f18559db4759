import type { QueryInterface } from 'sequelize';
import { DataTypes } from 'sequelize';

// Sign-in attempt counters, shared by every instance (see server/middleware/rate-limit-store.ts).
export async function up(queryInterface: QueryInterface) {
  await queryInterface.createTable('rate_limit_hits', {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reset_at_ms: { type: DataTypes.BIGINT, allowNull: false },
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.dropTable('rate_limit_hits');
}
