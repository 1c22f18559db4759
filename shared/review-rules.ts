// The rules a review must meet, used by the scoring screen (to warn before a round trip) and by
// the server (which decides). Pure: no React, no Express, no database.
import type { CaptureRecord } from './capture-record';
import type { Decision, ScoreInput } from './review';
import { type Criterion, criterionApplies, type RubricDefinition, scaleMax } from './rubric';
import { type Evaluation, isBelowFullMarks, type ScoreSheet } from './scoring';

export type FieldProblems = Record<string, string>;

// How long a claim lasts without activity, unless the server's CLAIM_MINUTES says otherwise.
export const DEFAULT_CLAIM_MINUTES = 30;

export function claimExpiresAt(now: Date, claimMinutes: number): Date {
  return new Date(now.getTime() + claimMinutes * 60_000);
}

export function applicability(criteria: Criterion[], record: CaptureRecord): Record<string, boolean> {
  return Object.fromEntries(criteria.map((c) => [c.key, criterionApplies(c, record)]));
}

// Checks a score sheet against the rubric and the record; field names follow the form
// (`scores.<key>`, `scores.<key>.comment`, `scores.<key>.stockReason`).
export function validateScores(
  criteria: Criterion[],
  record: CaptureRecord,
  scores: ScoreInput[],
): { fields: FieldProblems; sheet: ScoreSheet } {
  const fields: FieldProblems = {};
  const byKey = new Map(scores.map((s) => [s.key, s]));
  const applies = applicability(criteria, record);
  for (const extra of scores.filter((s) => !criteria.some((c) => c.key === s.key)))
    fields[`scores.${extra.key}`] = 'Not a criterion of this rubric';
  for (const criterion of criteria) {
    const field = `scores.${criterion.key}`;
    const input = byKey.get(criterion.key);
    if (!applies[criterion.key]) {
      if (input && input.score !== null) fields[field] = 'This criterion does not apply to this record';
      continue;
    }
    if (!input || input.score === null) {
      fields[field] = 'Score this criterion';
      continue;
    }
    const max = scaleMax(criterion.scale);
    if (!Number.isInteger(input.score) || input.score < 0 || input.score > max) {
      fields[field] = `Score from 0 to ${max}`;
      continue;
    }
    if (input.stockReason && !criterion.stockReasons.includes(input.stockReason)) fields[`${field}.stockReason`] = 'Choose a listed reason';
    if (isBelowFullMarks(criterion, input.score) && !input.comment.trim()) fields[`${field}.comment`] = 'Explain what falls short';
  }
  const sheet: ScoreSheet = Object.fromEntries(
    criteria.map((c) => [c.key, applies[c.key] ? (byKey.get(c.key)?.score ?? undefined) : null]),
  );
  return { fields, sheet };
}

// A failing score can be sent back or recaptured, never accepted.
export function decisionProblem(decision: Decision, evaluation: Evaluation): string | null {
  if (decision === 'accept' && evaluation.complete && !evaluation.passed)
    return `A failing review cannot be accepted: ${evaluation.failedRules.join(' ')}`;
  return null;
}

export const RUBRIC_WEIGHT_TOTAL = 100;

export function weightTotal(criteria: { weight: number | string }[]): number {
  return criteria.reduce((sum, c) => sum + (Number(c.weight) || 0), 0);
}

// Rules a rubric as a whole must meet, beyond each criterion's own field checks.
export function rubricProblems(definition: Pick<RubricDefinition, 'criteria'>): FieldProblems {
  const fields: FieldProblems = {};
  if (weightTotal(definition.criteria) !== RUBRIC_WEIGHT_TOTAL) fields.criteria = `Weights must add up to ${RUBRIC_WEIGHT_TOTAL}`;
  else if (new Set(definition.criteria.map((c) => c.key)).size !== definition.criteria.length) fields.criteria = 'Each key only once';
  return fields;
}
