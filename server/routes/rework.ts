import { Router } from 'express';
import { body, param } from 'express-validator';

import { REWORK_RESPONSES } from '../../shared/review';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { answerReworkItem, decideDispute, jobTimeline, listOpenDisputes, listReworkItems } from '../services/rework-service';

// Mounted at /api: rework items and their answers, disputes, and the job timeline.
export const reworkRouter = Router();

const jobId = param('id', 'Must be a job id').isInt({ min: 1 }).toInt();
const itemId = param('id', 'Must be a rework item id').isInt({ min: 1 }).toInt();
const anyone = requireRole('technician', 'reviewer', 'manager', 'admin');

reworkRouter.get('/jobs/:id/rework-items', anyone, validate(jobId), async (req, res) => {
  res.json({ items: await listReworkItems(req.user!, Number(req.params.id)) });
});

reworkRouter.put(
  '/rework-items/:id/response',
  requireRole('technician'),
  validate(
    itemId,
    body('response', `Choose one of: ${REWORK_RESPONSES.join(', ')}`).isIn(REWORK_RESPONSES),
    body('note', 'Text of at most 2000 characters').isString().isLength({ max: 2000 }),
    body('fileIds', 'A list of file ids').optional().isArray({ max: 20 }),
    body('fileIds.*', 'File ids are whole numbers').isInt({ min: 1 }).toInt(),
  ),
  async (req, res) => {
    res.json({
      item: await answerReworkItem(req.user!, Number(req.params.id), {
        response: req.body.response,
        note: req.body.note,
        fileIds: req.body.fileIds,
      }),
    });
  },
);

reworkRouter.get('/disputes', requireRole('manager'), async (_req, res) => {
  res.json({ disputes: await listOpenDisputes() });
});

reworkRouter.put(
  '/rework-items/:id/dispute-outcome',
  requireRole('manager'),
  validate(
    itemId,
    body('outcome', 'Choose upheld or withdrawn').isIn(['upheld', 'withdrawn']),
    body('note', 'Text of at most 2000 characters').isString().isLength({ max: 2000 }),
  ),
  async (req, res) => {
    res.json({ item: await decideDispute(req.user!, Number(req.params.id), { outcome: req.body.outcome, note: req.body.note }) });
  },
);

reworkRouter.get('/jobs/:id/timeline', anyone, validate(jobId), async (req, res) => {
  res.json({ events: await jobTimeline(req.user!, Number(req.params.id)) });
});
