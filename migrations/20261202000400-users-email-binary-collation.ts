import type { QueryInterface } from 'sequelize';
import { QueryTypes } from 'sequelize';

// E-mails are stored folded to lower case and compared byte for byte: with the default
// accent-insensitive collation "tëss@…" would find "tess@…", and the sign-in counters, which
// key on the typed form, would not line up with the account MariaDB matched.
export async function up(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query('UPDATE users SET email = LOWER(TRIM(email))', { type: QueryTypes.UPDATE });
  await queryInterface.sequelize.query('ALTER TABLE users MODIFY email VARCHAR(254) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL', {
    type: QueryTypes.RAW,
  });
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.sequelize.query(
    'ALTER TABLE users MODIFY email VARCHAR(254) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci NOT NULL',
    {
      type: QueryTypes.RAW,
    },
  );
}
