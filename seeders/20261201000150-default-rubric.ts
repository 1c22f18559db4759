import { type QueryInterface, QueryTypes } from 'sequelize';

import { DEFAULT_RUBRIC } from '../shared/default-rubric';

// Version 1 of the rubric, only when no rubric exists yet (a manager's later versions stay).
export async function up(queryInterface: QueryInterface) {
  const rows = await queryInterface.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM rubrics', { type: QueryTypes.SELECT });
  if (Number(rows[0].n) > 0) return;
  await queryInterface.bulkInsert('rubrics', [
    {
      version: 1,
      pass_mark: DEFAULT_RUBRIC.passMark,
      criteria: JSON.stringify(DEFAULT_RUBRIC.criteria),
      created_by_id: null,
      created_at: new Date(),
    },
  ]);
}

export async function down(queryInterface: QueryInterface) {
  await queryInterface.bulkDelete('rubrics', { version: 1 });
}
