import { Router } from 'express';
import { param, query } from 'express-validator';

import { requireBaseVersion } from '../middleware/base-version';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { claimJob, reassignClaims, releaseClaim } from '../services/claims-service';
import { saveReviewDraft } from '../services/review-draft-service';
import { claimSecondReview, getWorkspace, listOpenSecondReviews, submitReview, submitSecondReview } from '../services/review-service';
import { listActiveReviewers } from '../services/users-service';
import { reassignRules, reviewDraftRules, reviewRules } from '../validators/review';

// Mounted at /api: claims, the scoring workspace, decisions and blind second reviews.
export const reviewsRouter = Router();

const jobId = param('id', 'Must be a job id').isInt({ min: 1 }).toInt();

reviewsRouter.post('/jobs/:id/claim', requireRole('reviewer'), validate(jobId), async (req, res) => {
  res.json(await claimJob(req.user!, Number(req.params.id)));
});

reviewsRouter.delete('/jobs/:id/claim', requireRole('reviewer', 'manager'), validate(jobId), async (req, res) => {
  await releaseClaim(req.user!, Number(req.params.id));
  res.status(204).end();
});

reviewsRouter.post('/claims/reassign', requireRole('manager'), validate(...reassignRules), async (req, res) => {
  res.json(await reassignClaims(req.user!, req.body));
});

reviewsRouter.get(
  '/jobs/:id/workspace',
  requireRole('reviewer', 'manager'),
  validate(jobId, query('second', 'Must be a second-review id').optional().isInt({ min: 1 }).toInt()),
  async (req, res) => {
    res.json(await getWorkspace(req.user!, Number(req.params.id), req.query.second ? Number(req.query.second) : null));
  },
);

// The reviewer's unsaved scores for their claim (`?second=` for a blind second review).
reviewsRouter.put(
  '/jobs/:id/review-draft',
  requireRole('reviewer'),
  requireBaseVersion,
  validate(jobId, query('second', 'Must be a second-review id').optional().isInt({ min: 1 }).toInt(), ...reviewDraftRules),
  async (req, res) => {
    const second = req.query.second ? Number(req.query.second) : null;
    const data = { decision: req.body.decision ?? null, scores: req.body.scores, note: req.body.note ?? '' };
    res.json({ draft: await saveReviewDraft(req.user!, Number(req.params.id), second, data, req.baseVersion!) });
  },
);

// The server recomputes the score from the criterion scores; any total the client sends is ignored.
reviewsRouter.post('/jobs/:id/reviews', requireRole('reviewer'), validate(jobId, ...reviewRules), async (req, res) => {
  res.status(201).json(
    await submitReview(req.user!, Number(req.params.id), {
      decision: req.body.decision,
      scores: req.body.scores,
      note: req.body.note ?? '',
    }),
  );
});

reviewsRouter.get('/second-reviews', requireRole('reviewer'), async (req, res) => {
  res.json({ secondReviews: await listOpenSecondReviews(req.user!) });
});

reviewsRouter.post(
  '/second-reviews/:id/claim',
  requireRole('reviewer'),
  validate(param('id', 'Must be a second-review id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    res.json(await claimSecondReview(req.user!, Number(req.params.id)));
  },
);

reviewsRouter.post(
  '/second-reviews/:id/reviews',
  requireRole('reviewer'),
  validate(param('id', 'Must be a second-review id').isInt({ min: 1 }).toInt(), ...reviewRules),
  async (req, res) => {
    res.status(201).json(
      await submitSecondReview(req.user!, Number(req.params.id), {
        decision: req.body.decision,
        scores: req.body.scores,
        note: req.body.note ?? '',
      }),
    );
  },
);

reviewsRouter.get('/reviewers', requireRole('manager'), async (_req, res) => {
  res.json({ reviewers: await listActiveReviewers() });
});
