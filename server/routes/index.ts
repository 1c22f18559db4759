import type { Router } from 'express';

import { deliveryRouter } from './delivery';
import { filesRouter } from './files';
import { healthRouter } from './health';
import { jobsRouter } from './jobs';
import { mailboxRouter } from './mailbox';
import { meRouter } from './me';
import { notificationsRouter } from './notifications';
import { outboxRouter } from './outbox';
import { passwordRouter } from './password';
import { queueRouter } from './queue';
import { reviewsRouter } from './reviews';
import { reworkRouter } from './rework';
import { riskModelRouter } from './risk-model';
import { rubricsRouter } from './rubrics';
import { sessionRouter } from './session';
import { shareRouter } from './share';
import { techniciansRouter } from './technicians';
import { trendsRouter } from './trends';
import { usersRouter } from './users';
import { visitPlansRouter } from './visit-plans';

// Every API router and where it is mounted. The route-access test walks this list, so a
// new route cannot ship without an entry in its role table.
export const apiRouters: { prefix: string; router: Router }[] = [
  { prefix: '/api/health', router: healthRouter },
  { prefix: '/api/session', router: sessionRouter },
  { prefix: '/api/me', router: meRouter },
  { prefix: '/api/password', router: passwordRouter },
  { prefix: '/api/users', router: usersRouter },
  { prefix: '/api/technicians', router: techniciansRouter },
  { prefix: '/api/jobs', router: jobsRouter },
  { prefix: '/api/files', router: filesRouter },
  { prefix: '/api/queue', router: queueRouter },
  { prefix: '/api/rubrics', router: rubricsRouter },
  { prefix: '/api', router: reviewsRouter },
  { prefix: '/api', router: reworkRouter },
  { prefix: '/api/mailbox', router: mailboxRouter },
  { prefix: '/api/outbox', router: outboxRouter },
  { prefix: '/api/trends', router: trendsRouter },
  { prefix: '/api', router: deliveryRouter },
  { prefix: '/api/share', router: shareRouter },
  { prefix: '/api/notifications', router: notificationsRouter },
  { prefix: '/api', router: visitPlansRouter },
  { prefix: '/api/risk-model', router: riskModelRouter },
];
