import { Router } from 'express';

import type { JobStatus } from '../../shared/jobs';
import type { QueueSort } from '../../shared/review';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { listQueue } from '../services/queue-service';
import { queueQueryRules } from '../validators/review';

export const queueRouter = Router();

// GET /api/queue: one page of the review queue, filtered and sorted in SQL.
queueRouter.get('/', requireRole('reviewer', 'manager'), validate(...queueQueryRules), async (req, res) => {
  const q = req.query as Record<string, string | undefined>;
  res.json(
    await listQueue(req.user!, {
      page: Number(q.page ?? 1),
      pageSize: Number(q.pageSize ?? 25),
      sort: q.sort as QueueSort | undefined,
      dir: q.dir === 'desc' ? 'desc' : 'asc',
      search: q.q || undefined,
      filters: {
        status: q.status ? (q.status.split(',') as JobStatus[]) : undefined,
        technicianId: q.technicianId ? Number(q.technicianId) : undefined,
        lossType: q.lossType as never,
        priority: q.priority as never,
        cameraClass: q.cameraClass as never,
        submission: q.submission as 'first' | 'resubmission' | undefined,
        claimedByMe: q.claimedByMe === 'true',
      },
    }),
  );
});
