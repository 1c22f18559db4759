// The rework-risk model: read by everyone (the phone computes the hint from its coefficients),
// refitted on demand by a manager.
import { Router } from 'express';

import { conflict } from '../errors';
import { requireRole } from '../middleware/require-auth';
import { fitAndStoreRiskModel, latestRiskModel } from '../services/risk-model-service';

export const riskModelRouter = Router();

riskModelRouter.get('/', requireRole('technician', 'reviewer', 'manager', 'admin'), async (_req, res) => {
  res.json({ model: await latestRiskModel() });
});

riskModelRouter.post('/fit', requireRole('manager'), async (_req, res) => {
  const model = await fitAndStoreRiskModel();
  if (!model) throw conflict('The model is being fitted right now by another server. Try again in a minute.');
  res.status(201).json({ model });
});
