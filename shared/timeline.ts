// Timeline events in words.
import { type Decision, DECISION_LABELS, type TimelineEvent } from './review';

const EMAIL_KIND: Record<string, string> = {
  rework_request: 'rework request',
  accepted: 'acceptance notice',
  recapture_required: 'recapture notice',
  rework_reminder: 'rework reminder',
  review_outcome: 'review outcome notice',
};

export function describeEvent(event: Pick<TimelineEvent, 'type' | 'data'>): string {
  const d = event.data as Record<string, string | number | boolean | null>;
  switch (event.type) {
    case 'created':
      return `Job created (${d.claimReference})`;
    case 'assigned':
      return 'Assigned to the technician';
    case 'reassigned':
      return 'Reassigned to another technician';
    case 'submitted':
      return `Capture record submitted as revision ${d.revision}`;
    case 'claimed':
      return 'Claimed for review';
    case 'released':
      return 'Claim released';
    case 'claim_reassigned':
      return 'Claim moved to another reviewer';
    case 'reviewed':
      if (d.hidden) return `Reviewed (revision ${d.revision}); the outcome is hidden while a blind second review is open`;
      return `Reviewed: ${DECISION_LABELS[d.decision as Decision] ?? d.decision}, score ${d.score ?? '–'} (rubric version ${d.rubricVersion}, revision ${d.revision})`;
    case 'blind_second_review':
      return `Blind second review of revision ${d.revision}`;
    case 'email_queued':
      return `E-mail queued: ${EMAIL_KIND[String(d.kind)] ?? d.kind}`;
    case 'email_sent':
      return `E-mail sent: ${EMAIL_KIND[String(d.kind)] ?? d.kind}`;
    case 'email_failed':
      return `E-mail not sent yet (attempt ${d.attempt}); will retry`;
    case 'rework_answered':
      return `Rework answered: "${d.title}", ${String(d.response).replace('_', ' ')}`;
    case 'dispute_decided':
      return `Dispute on "${d.title}" ${d.outcome}`;
    default:
      return event.type;
  }
}
