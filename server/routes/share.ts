import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';

import { notFound } from '../errors';
import { MariaDbRateLimitStore } from '../middleware/rate-limit-store';
import { sharedPhoto, sharedSummary, sharedSummaryPdf } from '../services/shared-view-service';
import { sendStoredFile } from './files';

// The adjuster's read-only view, for anyone holding a live link: no session, no account.
// Rate-limited per address (counted in MariaDB, so every instance shares the count), which
// also makes guessing a 256-bit token pointless twice over.
export const shareRouter = Router();

shareRouter.use(
  rateLimit({
    windowMs: 60_000,
    limit: 120,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new MariaDbRateLimitStore('share-ip'),
    handler: (_req, res) =>
      res
        .status(429)
        .json({ error: { code: 'too_many_requests', message: 'Too many requests from this address. Wait a minute and try again.' } }),
  }),
);

shareRouter.get('/:token', async (req, res) => {
  res.setHeader('Cache-Control', 'no-store');
  res.json(await sharedSummary(req.params.token as string, req.ip));
});

shareRouter.get('/:token/summary.pdf', async (req, res) => {
  const { file, stream } = await sharedSummaryPdf(req.params.token as string, req.ip);
  await sendStoredFile(res, file, stream);
});

shareRouter.get('/:token/photos/:fileId', async (req, res, next) => {
  const fileId = Number(req.params.fileId);
  if (!Number.isInteger(fileId) || fileId < 1) return next(notFound('Photo'));
  const { file, stream } = await sharedPhoto(req.params.token as string, fileId);
  await sendStoredFile(res, file, stream);
});
