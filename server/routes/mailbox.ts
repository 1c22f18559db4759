import { type NextFunction, type Request, type Response, Router } from 'express';

import { config } from '../config';
import { HttpError } from '../errors';
import { requireAuth, requireRole } from '../middleware/require-auth';

export const mailboxRouter = Router();

// The local fake SMTP server's messages: always for admins, for everyone in development.
const mailboxAccess = (req: Request, res: Response, next: NextFunction) =>
  config.mailboxOpenToAll ? requireAuth(req, res, next) : requireRole('admin')(req, res, next);

mailboxRouter.get('/', mailboxAccess, async (_req, res) => {
  let response: globalThis.Response;
  try {
    response = await fetch(`${config.mailboxUrl}/messages`);
  } catch {
    throw new HttpError(503, 'mailbox_unavailable', 'The local mailbox cannot be reached. Is the fake SMTP server running?');
  }
  if (!response.ok) throw new HttpError(503, 'mailbox_unavailable', 'The local mailbox did not answer.');
  res.json({ messages: await response.json() });
});
