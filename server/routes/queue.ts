import { Router } from 'express';

import type { JobStatus } from '../../shared/jobs';
import type { QueueSort } from '../../shared/review';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { claimNext } from '../services/claims-service';
import { listQueue } from '../services/queue-service';
import { queueQueryRules } from '../validators/review';

export const queueRouter = Router();

// The queue's filters, sort and search from a validated query string.
function queueParams(query: Record<string, string | undefined>) {
  return {
    sort: query.sort as QueueSort | undefined,
    dir: query.dir === 'desc' ? ('desc' as const) : ('asc' as const),
    search: query.q || undefined,
    filters: {
      status: query.status ? (query.status.split(',') as JobStatus[]) : undefined,
      technicianId: query.technicianId ? Number(query.technicianId) : undefined,
      lossType: query.lossType as never,
      priority: query.priority as never,
      cameraClass: query.cameraClass as never,
      submission: query.submission as 'first' | 'resubmission' | undefined,
      claimedByMe: query.claimedByMe === 'true',
    },
  };
}

// GET /api/queue: one page of the review queue, filtered and sorted in SQL.
queueRouter.get('/', requireRole('reviewer', 'manager'), validate(...queueQueryRules), async (req, res) => {
  const q = req.query as Record<string, string | undefined>;
  res.json(await listQueue(req.user!, { page: Number(q.page ?? 1), pageSize: Number(q.pageSize ?? 25), ...queueParams(q) }));
});

// POST /api/queue/claim-next: claims the next free record in the same filter and sort, so a
// reviewer goes from one decision to the next record without returning to the queue.
queueRouter.post('/claim-next', requireRole('reviewer'), validate(...queueQueryRules), async (req, res) => {
  const claimed = await claimNext(req.user!, queueParams(req.query as Record<string, string | undefined>));
  res.json(claimed ? { ...claimed, found: true } : { found: false, jobId: null });
});
