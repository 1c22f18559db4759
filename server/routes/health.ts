import { Router } from 'express';

import { sequelize } from '../db';

export const healthRouter = Router();

// Public on purpose: a load balancer probes it without a session.
healthRouter.get('/', async (_req, res) => {
  try {
    await sequelize.authenticate();
    res.json({ status: 'ok', database: 'reachable' });
  } catch {
    res.status(503).json({ error: { code: 'database_unreachable', message: 'The database cannot be reached.' } });
  }
});
