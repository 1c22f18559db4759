// Timeline events in words.
import { type Decision, DECISION_LABELS, type TimelineEvent } from './review';

const EMAIL_KIND: Record<string, string> = {
  rework_request: 'rework request',
  accepted: 'acceptance notice',
  recapture_required: 'recapture notice',
  rework_reminder: 'rework reminder',
  review_outcome: 'review outcome notice',
  delivery: 'summary link to the adjuster',
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
      return `Reviewed: ${DECISION_LABELS[d.decision as Decision] ?? d.decision}, score ${d.score ?? '–'} (rubric version ${d.rubricVersion}, revision ${d.revision})${d.note ? `. Note from the reviewer: ${String(d.note)}` : ''}`;
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
    case 'summary_queued':
      return d.notify ? 'Acceptance summary queued for the adjuster' : 'Acceptance summary rebuild requested';
    case 'summary_built':
      return 'Acceptance summary built (PDF added to the files)';
    case 'share_link_issued':
      return `Share link issued, open until ${String(d.expiresAt).slice(0, 10)}`;
    case 'share_link_revoked':
      return 'Share link withdrawn';
    case 'share_viewed':
      return `Shared ${d.what === 'pdf' ? 'summary PDF downloaded' : 'summary opened'} from ${d.address}`;
    default:
      return event.type;
  }
}
