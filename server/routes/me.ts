import { Router } from 'express';
import { body } from 'express-validator';

import { config } from '../config';
import { requireAuth } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { changePassword } from '../services/account-service';

export const meRouter = Router();

meRouter.get('/', requireAuth, (req, res) => {
  // mailboxOpen: whether this person may read the local fake mailbox (shapes the menu only).
  res.json({ user: { ...req.user, mailboxOpen: req.user!.role === 'admin' || config.mailboxOpenToAll } });
});

// Changing one's own password needs the current one; every other session of the account ends.
meRouter.put(
  '/password',
  requireAuth,
  validate(
    body('currentPassword', 'Enter your current password').isString().isLength({ min: 1, max: 300 }),
    body('newPassword', 'Enter a new password').isString().isLength({ min: 1, max: 300 }),
  ),
  async (req, res) => {
    await changePassword(req.user!.id, req.sessionID, req.body.currentPassword, req.body.newPassword);
    res.status(204).end();
  },
);
