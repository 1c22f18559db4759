import { Router } from 'express';
import { param } from 'express-validator';

import { inTransaction } from '../db';
import { notFound } from '../errors';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { deliveryState, requestSummary } from '../services/delivery-service';
import { findJobFor } from '../services/job-access';
import { issueShareLink, revokeShareLink } from '../services/share-service';

// A manager's side of delivery: see the summary builds and links, rebuild the summary,
// issue a new link (ending the old one) or withdraw it.
export const deliveryRouter = Router();
const managers = requireRole('manager', 'admin');
const jobId = param('id', 'Must be a job id').isInt({ min: 1 }).toInt();

deliveryRouter.get('/jobs/:id/delivery', managers, validate(jobId), async (req, res) => {
  await findJobFor(req.user!, Number(req.params.id));
  res.json(await deliveryState(Number(req.params.id)));
});

deliveryRouter.post('/jobs/:id/summary', requireRole('manager'), validate(jobId), async (req, res) => {
  await findJobFor(req.user!, Number(req.params.id));
  await requestSummary(req.user!.id, Number(req.params.id));
  res.status(202).json(await deliveryState(Number(req.params.id)));
});

// The raw link is in this answer only (and in the adjuster's e-mail): it is stored hashed.
deliveryRouter.post('/jobs/:id/share-links', requireRole('manager'), validate(jobId), async (req, res) => {
  const job = await findJobFor(req.user!, Number(req.params.id));
  if (job.status !== 'accepted') throw notFound('An accepted capture for this job');
  const issued = await inTransaction((transaction) => issueShareLink(transaction, job.id, req.user!.id));
  res.status(201).json({ url: issued.url, expiresAt: issued.link.expiresAt.toISOString(), delivery: await deliveryState(job.id) });
});

deliveryRouter.delete(
  '/jobs/:id/share-links/:linkId',
  requireRole('manager'),
  validate(jobId, param('linkId', 'Must be a link id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    await findJobFor(req.user!, Number(req.params.id));
    await revokeShareLink(Number(req.params.id), Number(req.params.linkId), req.user!.id);
    res.status(204).end();
  },
);
