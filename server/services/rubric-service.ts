import type { Transaction } from 'sequelize';

import type { Rubric as RubricView, RubricDefinition } from '../../shared/rubric';
import { inTransaction } from '../db';
import { HttpError } from '../errors';
import { Rubric } from '../models';

export function toRubricView(rubric: Rubric): RubricView {
  return {
    id: rubric.id,
    version: rubric.version,
    passMark: rubric.passMark,
    criteria: rubric.criteria,
    createdAt: rubric.createdAt.toISOString(),
  };
}

export async function currentRubric(transaction?: Transaction): Promise<Rubric> {
  const rubric = await Rubric.findOne({ order: [['version', 'DESC']], transaction });
  if (!rubric) throw new HttpError(503, 'no_rubric', 'No rubric has been set up yet.');
  return rubric;
}

export async function listRubrics() {
  const rubrics = await Rubric.findAll({ order: [['version', 'DESC']] });
  return rubrics.map(toRubricView);
}

// Saving never edits a version: it adds the next one, so reviews keep the version they used.
export async function createRubricVersion(actorId: number, definition: RubricDefinition) {
  return inTransaction(async (transaction) => {
    const latest = await Rubric.findOne({ order: [['version', 'DESC']], transaction, lock: transaction.LOCK.UPDATE });
    const rubric = await Rubric.create(
      { version: (latest?.version ?? 0) + 1, passMark: definition.passMark, criteria: definition.criteria, createdById: actorId },
      { transaction },
    );
    return toRubricView(rubric);
  });
}
