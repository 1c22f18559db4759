// Shapes the API sends and receives, shared so client and server cannot drift apart.
import type { CaptureRecord } from './capture-record';
import type { ClaimContacts } from './contacts';
import type { DeliverySummary } from './delivery-summary';
import type { StoredFile } from './files';
import type { JobSummary } from './jobs';
import type { CheckResult } from './pre-submit-checks';
import type { Decision, ReworkItemView } from './review';
import type { Role } from './roles';
import type { StationAnalysis } from './station-analysis';

export type ApiErrorBody = {
  error: { code: string; message: string; fields?: Record<string, string> };
};

export type SessionUser = { id: number; name: string; email: string; role: Role; mailboxOpen?: boolean };

export type UserRow = SessionUser & { active: boolean; createdAt: string };

// GET /api/jobs/:id
export type JobDetail = {
  job: JobSummary;
  contacts: ClaimContacts;
  record: CaptureRecord;
  recordVersion: number;
  recordSavedAt: string | null;
  revisions: { number: number; submittedAt: string }[];
  files: StoredFile[];
};

// GET /api/jobs/:id/revisions/:n
export type RevisionView = {
  number: number;
  submittedAt: string;
  record: CaptureRecord;
  files: StoredFile[];
  findings: CheckResult;
  stationAnalysis: StationAnalysis | null;
};

// POST /api/jobs/:id/reviews and /api/second-reviews/:id/reviews
export type ReviewResult = {
  reviewId: number;
  score: number | null;
  passed: boolean;
  decision?: Decision;
  failedRules?: string[];
  // Whether the technician's e-mail was queued: they may have turned that e-mail off.
  emailQueued?: boolean;
};

// GET /api/second-reviews
export type OpenSecondReview = { id: number; jobId: number; claimReference: string; revision: number; createdAt: string };

// GET /api/disputes
export type Dispute = ReworkItemView & { jobId: number; claimReference: string; technician: string };

// GET /api/mailbox (what the local fake SMTP server caught)
export type MailboxMessage = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

export type PersonRef = { id: number; name: string };

// GET /api/outbox/failed
export type FailedEmail = {
  id: number;
  jobId: number | null;
  kind: string;
  subject: string;
  attempts: number;
  lastError: string | null;
  createdAt: string;
};

// GET /api/jobs/:id/delivery (managers): the share links and the summary builds.
export type ShareLinkView = {
  id: number;
  createdAt: string;
  expiresAt: string;
  revokedAt: string | null;
  state: 'active' | 'expired' | 'revoked';
};
export type DeliveryView = {
  id: number;
  status: 'pending' | 'built' | 'failed';
  notify: boolean;
  createdAt: string;
  builtAt: string | null;
  lastError: string | null;
};
export type DeliveryState = { links: ShareLinkView[]; deliveries: DeliveryView[]; summaryFileId: number | null; accepted: boolean };

// GET /api/share/:token: the acceptance summary, for anyone holding the link.
export type SharedSummary = { summary: DeliverySummary; pdfAvailable: boolean };
