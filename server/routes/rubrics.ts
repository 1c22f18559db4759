import { Router } from 'express';

import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { createRubricVersion, currentRubric, listRubrics, toRubricView } from '../services/rubric-service';
import { rubricRules } from '../validators/review';

export const rubricsRouter = Router();

rubricsRouter.get('/', requireRole('reviewer', 'manager'), async (_req, res) => {
  res.json({ rubrics: await listRubrics() });
});

rubricsRouter.get('/current', requireRole('reviewer', 'manager'), async (_req, res) => {
  res.json({ rubric: toRubricView(await currentRubric()) });
});

rubricsRouter.post('/', requireRole('manager'), validate(...rubricRules), async (req, res) => {
  const { passMark, criteria } = req.body;
  res.status(201).json({ rubric: await createRubricVersion(req.user!.id, { passMark, criteria }) });
});
