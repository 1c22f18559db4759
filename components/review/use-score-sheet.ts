// The reviewer's scores for one workspace: where they start (the reviewer's own saved draft,
// else carried over from the last review where the inputs did not change), how they change,
// the chosen decision, and the live evaluation.
import { useMemo, useState } from 'react';

import type { Decision, ScoreInput, Workspace } from '@/shared/review';
import { scaleMax } from '@/shared/rubric';
import { evaluate, type ScoreSheet } from '@/shared/scoring';

import type { CriterionEntry } from './criterion-row';

function startingEntries(workspace: Workspace): Record<string, CriterionEntry> {
  const carried = workspace.previous?.carried ?? {};
  const drafted = new Map((workspace.draft?.scores ?? []).map((s) => [s.key, s]));
  return Object.fromEntries(
    workspace.rubric.criteria.map((c) => {
      const saved = drafted.get(c.key);
      const from = workspace.applicable[c.key] ? carried[c.key] : undefined;
      const entry: CriterionEntry = saved
        ? { score: workspace.applicable[c.key] ? (saved.score ?? undefined) : null, stockReason: saved.stockReason, comment: saved.comment }
        : from
          ? { score: from.score ?? undefined, stockReason: from.stockReason, comment: from.comment }
          : { score: workspace.applicable[c.key] ? undefined : null, stockReason: null, comment: '' };
      return [c.key, entry];
    }),
  );
}

export function useScoreSheet(workspace: Workspace) {
  const { rubric, applicable } = workspace;
  const [entries, setEntries] = useState<Record<string, CriterionEntry>>(() => startingEntries(workspace));
  const [decision, setDecision] = useState<Decision | undefined>(workspace.draft?.decision ?? undefined);
  // The overall note to the technician, beside the per-criterion comments.
  const [note, setNote] = useState(workspace.draft?.note ?? '');
  const sheet: ScoreSheet = useMemo(() => Object.fromEntries(rubric.criteria.map((c) => [c.key, entries[c.key].score])), [entries, rubric]);
  const evaluation = evaluate(rubric, sheet);

  const setEntry = (key: string, entry: CriterionEntry) => setEntries((e) => ({ ...e, [key]: entry }));
  const setScore = (index: number, value: number) => {
    const criterion = rubric.criteria[index];
    if (!criterion || !applicable[criterion.key] || value > scaleMax(criterion.scale)) return;
    setEntries((e) => ({ ...e, [criterion.key]: { ...e[criterion.key], score: value } }));
  };
  const scoreInputs = (): ScoreInput[] =>
    rubric.criteria.map((c) => ({
      key: c.key,
      score: entries[c.key].score ?? null,
      stockReason: entries[c.key].stockReason,
      comment: entries[c.key].comment,
    }));
  const replace = (scores: ScoreInput[], chosen: Decision | null, savedNote = '') => {
    setEntries(
      startingEntries({ ...workspace, draft: { scores, decision: chosen, version: 0, savedAt: '', revision: workspace.revision.number } }),
    );
    setDecision(chosen ?? undefined);
    setNote(savedNote);
  };

  return { entries, evaluation, setEntry, setScore, scoreInputs, decision, setDecision, note, setNote, replace };
}
