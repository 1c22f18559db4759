// Rebuilds the weekly trend rollups from the raw reviews and scores, in one transaction, so
// readers see the old rows or the new ones and never an empty table. The triggers keep them
// current afterwards; this is for bulk loads and for checking.
import { QueryTypes } from 'sequelize';

import { inTransaction, sequelize } from '../db';
import { REBUILD_STATEMENTS } from '../trends/rollup-sql';

export async function rebuildTrendRollups() {
  await inTransaction(async (transaction) => {
    for (const sql of REBUILD_STATEMENTS) await sequelize.query(sql, { transaction, type: QueryTypes.RAW });
  });
}
