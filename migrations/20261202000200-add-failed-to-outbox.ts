import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

// A message that kept failing ends as "failed" after the configured attempts, for managers to see.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query("ALTER TABLE outbox MODIFY status ENUM('pending', 'sent', 'failed') NOT NULL DEFAULT 'pending'", {
    type: QueryTypes.RAW,
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query("UPDATE outbox SET status = 'pending' WHERE status = 'failed'", { type: QueryTypes.UPDATE });
  await queryInterface.sequelize.query("ALTER TABLE outbox MODIFY status ENUM('pending', 'sent') NOT NULL DEFAULT 'pending'", {
    type: QueryTypes.RAW,
  });
}
