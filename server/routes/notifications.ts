import { Router } from 'express';
import { body, param } from 'express-validator';

import { NOTIFICATION_KINDS, type NotificationKind } from '../../shared/notifications';
import { requireAuth } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { listNotifications, listPrefs, markAllRead, markRead, setPref } from '../services/notification-service';

// Mounted at /api/notifications: everyone's own notices and e-mail choices, nobody else's.
export const notificationsRouter = Router();

notificationsRouter.get('/', requireAuth, async (req, res) => {
  res.json(await listNotifications(req.user!));
});

notificationsRouter.post('/read-all', requireAuth, async (req, res) => {
  await markAllRead(req.user!);
  res.status(204).end();
});

notificationsRouter.post(
  '/:id/read',
  requireAuth,
  validate(param('id', 'Must be a notification id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    await markRead(req.user!, Number(req.params.id));
    res.status(204).end();
  },
);

notificationsRouter.get('/prefs', requireAuth, async (req, res) => {
  res.json({ prefs: await listPrefs(req.user!) });
});

notificationsRouter.put(
  '/prefs/:kind',
  requireAuth,
  validate(
    param('kind', `One of: ${NOTIFICATION_KINDS.join(', ')}`).isIn(NOTIFICATION_KINDS),
    body('email', 'true or false').isBoolean({ strict: true }),
  ),
  async (req, res) => {
    res.json({ prefs: await setPref(req.user!, req.params.kind as NotificationKind, req.body.email === true) });
  },
);
