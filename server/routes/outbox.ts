import { Router } from 'express';
import { param } from 'express-validator';

import { notFound } from '../errors';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { listFailedEmails, retryFailedEmail } from '../services/outbox-service';

// E-mail that could not be sent after every attempt: managers and admins see it and, once the
// cause is fixed, send it again.
export const outboxRouter = Router();

outboxRouter.get('/failed', requireRole('manager', 'admin'), async (_req, res) => {
  res.json({ messages: await listFailedEmails() });
});

outboxRouter.post(
  '/:id/retry',
  requireRole('manager', 'admin'),
  validate(param('id', 'Must be a message id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    if (!(await retryFailedEmail(Number(req.params.id)))) throw notFound('Failed e-mail');
    res.json({ retried: true });
  },
);
