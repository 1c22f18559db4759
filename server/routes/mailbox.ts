import { type NextFunction, type Request, type Response, Router } from 'express';

import { config } from '../config';
import { HttpError } from '../errors';
import { requireAuth, requireRole } from '../middleware/require-auth';

export const mailboxRouter = Router();

// The local fake SMTP server's messages: all of them for admins. In development
// (MAILBOX_OPEN) other people may look too, but each sees only mail addressed to them.
const mailboxAccess = (req: Request, res: Response, next: NextFunction) =>
  config.mailboxOpenToAll ? requireAuth(req, res, next) : requireRole('admin')(req, res, next);

type Caught = { to: string[] };

mailboxRouter.get('/', mailboxAccess, async (req, res) => {
  let response: globalThis.Response;
  try {
    response = await fetch(`${config.mailboxUrl}/messages`);
  } catch {
    throw new HttpError(503, 'mailbox_unavailable', 'The local mailbox cannot be reached. Is the fake SMTP server running?');
  }
  if (!response.ok) throw new HttpError(503, 'mailbox_unavailable', 'The local mailbox did not answer.');
  const messages = (await response.json()) as Caught[];
  const me = req.user!;
  const mine = (m: Caught) => m.to.some((address) => address.toLowerCase() === me.email.toLowerCase());
  res.json({ messages: me.role === 'admin' ? messages : messages.filter(mine) });
});
