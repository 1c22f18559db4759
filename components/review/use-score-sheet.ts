// The reviewer's scores for one workspace: where they start (carried over from the last review
// where the inputs did not change), how they change, and the live evaluation.
import { useMemo, useState } from 'react';

import type { ScoreInput, Workspace } from '@/shared/review';
import { scaleMax } from '@/shared/rubric';
import { evaluate, type ScoreSheet } from '@/shared/scoring';

import type { CriterionEntry } from './criterion-row';

function startingEntries(workspace: Workspace): Record<string, CriterionEntry> {
  const carried = workspace.previous?.carried ?? {};
  return Object.fromEntries(
    workspace.rubric.criteria.map((c) => {
      const from = workspace.applicable[c.key] ? carried[c.key] : undefined;
      const entry: CriterionEntry = from
        ? { score: from.score ?? undefined, stockReason: from.stockReason, comment: from.comment }
        : { score: workspace.applicable[c.key] ? undefined : null, stockReason: null, comment: '' };
      return [c.key, entry];
    }),
  );
}

export function useScoreSheet(workspace: Workspace) {
  const { rubric, applicable } = workspace;
  const [entries, setEntries] = useState<Record<string, CriterionEntry>>(() => startingEntries(workspace));
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

  return { entries, evaluation, setEntry, setScore, scoreInputs };
}
