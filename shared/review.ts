// Shapes shared by the review API and screens.
import type { CameraClass, CaptureRecord } from './capture-record';
import type { StoredFile } from './files';
import type { JobStatus, LossType, Priority, PropertyType } from './jobs';
import type { CheckResult } from './pre-submit-checks';
import type { Change } from './revision-diff';
import type { Rubric } from './rubric';
import type { StationAnalysis } from './station-analysis';

export const DECISIONS = ['accept', 'rework', 'recapture'] as const;
export type Decision = (typeof DECISIONS)[number];
export const DECISION_LABELS: Record<Decision, string> = {
  accept: 'Accept',
  rework: 'Request rework',
  recapture: 'Recapture required (new site visit)',
};

export const QUEUE_STATUSES: JobStatus[] = ['submitted', 'in_review', 'resubmitted', 'rework_requested'];
export const QUEUE_SORTS = ['due', 'submitted', 'claim', 'technician', 'priority', 'revision', 'risk'] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];

export type QueueFilters = {
  status?: JobStatus[];
  technicianId?: number;
  lossType?: LossType;
  priority?: Priority;
  cameraClass?: CameraClass;
  submission?: 'first' | 'resubmission';
  claimedByMe?: boolean;
};

export type QueueRow = {
  id: number;
  claimReference: string;
  technician: { id: number; name: string };
  propertyType: PropertyType;
  lossType: LossType;
  cameraClass: CameraClass | null;
  revision: number;
  submittedAt: string | null;
  dueAt: string;
  priority: Priority;
  status: JobStatus;
  claimedBy: { id: number; name: string } | null;
  waitingOn: 'reviewer' | 'technician';
  pausedMs: number;
  // Rework-risk hint for the current revision: the probability it comes back, or null while
  // the model is withheld (not enough history).
  risk: number | null;
};

export type QueuePage = {
  rows: QueueRow[];
  total: number;
  page: number;
  pageSize: number;
  counts: Partial<Record<JobStatus, number>>;
};

export type ScoreInput = { key: string; score: number | null; stockReason: string | null; comment: string };

// A reviewer's unsaved work on one claim: scores and comments so far, and the chosen decision.
export type ReviewDraftData = { scores: ScoreInput[]; decision: Decision | null; note?: string };
export type ReviewDraft = ReviewDraftData & { version: number; savedAt: string; revision: number };

export type Workspace = {
  job: QueueRow & { street: string; city: string };
  revision: {
    number: number;
    submittedAt: string;
    record: CaptureRecord;
    files: StoredFile[];
    findings: CheckResult;
    stationAnalysis: StationAnalysis | null;
  };
  rubric: Rubric;
  applicable: Record<string, boolean>;
  claimExpiresAt: string | null;
  secondReviewId: number | null;
  secondClaimedByMe: boolean;
  // The signed-in reviewer's own saved draft for this claim; never anyone else's.
  draft: ReviewDraft | null;
  previous: {
    revision: number;
    score: number | null;
    // null while a blind second review of that revision is open (hidden: true).
    decision: Decision | null;
    hidden?: boolean;
    changes: Change[];
    items: ReworkItemView[];
    carried: Record<string, { score: number | null; stockReason: string | null; comment: string }>;
  } | null;
};

export const REWORK_RESPONSES = ['fixed', 'cannot_fix', 'disputed'] as const;
export type ReworkResponse = (typeof REWORK_RESPONSES)[number];
export const REWORK_RESPONSE_LABELS: Record<ReworkResponse, string> = {
  fixed: 'Fixed',
  cannot_fix: 'Cannot fix',
  disputed: 'Dispute it',
};

export type ReworkItemView = {
  id: number;
  criterionKey: string;
  title: string;
  instruction: string;
  stockReason: string | null;
  response: ReworkResponse | null;
  responseNote: string | null;
  responseFileIds: number[];
  respondedAt: string | null;
  disputeOutcome: 'upheld' | 'withdrawn' | null;
  disputeNote: string | null;
};

export type TimelineEvent = { id: number; type: string; data: Record<string, unknown>; createdAt: string; actor: string | null };

// What the reviewer is told once a decision is recorded: what happened and what was queued.
export function decisionOutcomeText(
  claimReference: string,
  decision: Decision,
  reworkItems: number,
  blindSecond: boolean,
  emailQueued = true,
): string {
  if (blindSecond) return `Blind second review saved for ${claimReference}. The job itself is unchanged.`;
  const mail = emailQueued ? 'E-mail to the technician queued' : 'The technician is told in the app (they turned this e-mail off)';
  if (decision === 'accept') return `Accepted ${claimReference}. ${mail}; the adjuster's summary is being built.`;
  if (decision === 'rework') return `Rework requested for ${claimReference} (${reworkItems} item${reworkItems === 1 ? '' : 's'}). ${mail}.`;
  return `Recapture required for ${claimReference}. ${mail}; the managers are e-mailed.`;
}
