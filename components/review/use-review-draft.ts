// Autosaves the reviewer's scores, comments and chosen decision to the server for this claim,
// so a reload, a stray click or another machine finds them again. Never shown to anyone else.
import { useCallback, useEffect, useRef, useState } from 'react';

import { ApiError } from '@/components/lib/api-client';
import { saveReviewDraft } from '@/components/queries/workspace';
import type { Decision, ReviewDraft, ScoreInput, Workspace } from '@/shared/review';

export type ReviewDraftStatus =
  | { kind: 'saved'; savedAt: string | null }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'conflict'; theirs: ReviewDraft }
  | { kind: 'error'; message: string };

const DEBOUNCE_MS = 800;
const RETRY_MS = 8000;

export function useReviewDraft(
  workspace: Workspace,
  snapshot: { scores: ScoreInput[]; decision: Decision | undefined; note: string },
  enabled: boolean,
) {
  const [status, setStatus] = useState<ReviewDraftStatus>({ kind: 'saved', savedAt: workspace.draft?.savedAt ?? null });
  const version = useRef(workspace.draft?.version ?? 0);
  const serial = JSON.stringify(snapshot);
  const sent = useRef(serial);
  const latest = useRef(snapshot);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const send = useRef<() => void>(() => undefined);
  const paused = useRef(false);

  const flush = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const current = JSON.stringify(latest.current);
    if (!enabled || paused.current || current === sent.current) return;
    setStatus({ kind: 'saving' });
    try {
      const { draft } = await saveReviewDraft(
        workspace.job.id,
        workspace.secondReviewId,
        {
          scores: latest.current.scores,
          decision: latest.current.decision ?? null,
        },
        version.current,
      );
      version.current = draft.version;
      sent.current = current;
      setStatus(JSON.stringify(latest.current) === current ? { kind: 'saved', savedAt: draft.savedAt } : { kind: 'pending' });
      if (JSON.stringify(latest.current) !== current) timer.current = setTimeout(() => send.current(), DEBOUNCE_MS);
    } catch (error) {
      if (error instanceof ApiError && error.code === 'stale_version') {
        paused.current = true;
        const theirs = (error.body as { current: ReviewDraft | null }).current;
        if (theirs) setStatus({ kind: 'conflict', theirs });
        else {
          version.current = 0;
          paused.current = false;
          timer.current = setTimeout(() => send.current(), 0);
        }
        return;
      }
      setStatus({ kind: 'error', message: error instanceof Error ? error.message : 'Not saved' });
      timer.current = setTimeout(() => send.current(), RETRY_MS);
    }
  }, [enabled, workspace.job.id, workspace.secondReviewId]);

  useEffect(() => {
    send.current = () => void flush();
  }, [flush]);

  useEffect(() => {
    latest.current = JSON.parse(serial) as typeof snapshot;
    if (!enabled || serial === sent.current || paused.current) return;

    setStatus({ kind: 'pending' });
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => send.current(), DEBOUNCE_MS);
  }, [serial, enabled]);

  // Leaving the screen (Queue, another record, a reload) sends what is pending first.
  useEffect(() => {
    const beforeUnload = (event: BeforeUnloadEvent) => {
      if (JSON.stringify(latest.current) !== sent.current) event.preventDefault();
    };
    if (typeof window !== 'undefined' && window.addEventListener) window.addEventListener('beforeunload', beforeUnload);
    return () => {
      if (typeof window !== 'undefined' && window.removeEventListener) window.removeEventListener('beforeunload', beforeUnload);
      send.current();
    };
  }, []);

  const resolve = useCallback(
    (keep: 'mine' | 'theirs', adopt: (draft: ReviewDraft) => void) => {
      if (status.kind !== 'conflict') return;
      version.current = status.theirs.version;
      paused.current = false;
      if (keep === 'theirs') {
        sent.current = JSON.stringify({ scores: status.theirs.scores, decision: status.theirs.decision ?? undefined });
        adopt(status.theirs);
        setStatus({ kind: 'saved', savedAt: status.theirs.savedAt });
      } else {
        sent.current = '';
        void flush();
      }
    },
    [flush, status],
  );

  return { status, flush, resolve };
}

export function describeReviewDraft(status: ReviewDraftStatus): string {
  switch (status.kind) {
    case 'saved':
      return status.savedAt
        ? `Draft saved ${new Date(status.savedAt).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}`
        : 'No scores yet';
    case 'pending':
      return 'Draft not saved yet — saving in a moment';
    case 'saving':
      return 'Saving draft…';
    case 'conflict':
      return 'This draft was changed in another tab — choose a version';
    case 'error':
      return `Draft not saved: ${status.message}. Trying again…`;
  }
}
