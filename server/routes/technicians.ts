import { Router } from 'express';

import { requireRole } from '../middleware/require-auth';
import { listTechnicians } from '../services/jobs-service';

export const techniciansRouter = Router();

// For the assignment form and the queue's technician filter: active technicians by name.
techniciansRouter.get('/', requireRole('reviewer', 'manager', 'admin'), async (_req, res) => {
  res.json({ technicians: await listTechnicians() });
});
