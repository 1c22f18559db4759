// Weighted review score and the pass rule.
//   score = 100 × Σ(weight × score/max) ÷ Σ(weight), over applicable criteria only
//   (not-applicable criteria drop out and the rest are renormalised), one decimal, half up.
//   pass  = score ≥ pass mark AND no critical criterion at its lowest level.
// The arithmetic is done in integers so that rounding half up is exact (84.95 → 85.0).
import { type Criterion, type RubricDefinition, scaleMax } from './rubric';

// null = not applicable; undefined = not scored yet.
export type ScoreSheet = Record<string, number | null | undefined>;

export type Evaluation = {
  complete: boolean;
  score: number | null;
  passed: boolean;
  failedRules: string[];
  criticalFailures: string[];
};

const LCM_OF_MAXIMA = 4; // scale maxima are 4 (levels) and 1 (pass/fail)

export function weightedScore(criteria: Criterion[], sheet: ScoreSheet): number | null {
  let numerator = 0;
  let denominator = 0;
  for (const criterion of criteria) {
    const value = sheet[criterion.key];
    if (value === null || value === undefined) continue;
    const max = scaleMax(criterion.scale);
    numerator += criterion.weight * value * (LCM_OF_MAXIMA / max);
    denominator += criterion.weight * LCM_OF_MAXIMA;
  }
  if (denominator === 0) return null;
  // tenths = round_half_up(1000 × numerator / denominator), exact for integer weights.
  if (Number.isInteger(numerator) && Number.isInteger(denominator)) {
    return Math.floor((2000 * numerator + denominator) / (2 * denominator)) / 10;
  }
  return Math.floor((1000 * numerator) / denominator + 0.5 + 1e-9) / 10;
}

export function evaluate(rubric: RubricDefinition, sheet: ScoreSheet): Evaluation {
  const missing = rubric.criteria.filter((c) => sheet[c.key] === undefined);
  const score = weightedScore(rubric.criteria, sheet);
  const criticalFailures = rubric.criteria.filter((c) => c.critical && sheet[c.key] === 0).map((c) => c.title);
  const failedRules: string[] = [];
  if (score !== null && score < rubric.passMark)
    failedRules.push(`Score ${score.toFixed(1)} is below the pass mark of ${rubric.passMark}.`);
  for (const title of criticalFailures) failedRules.push(`Critical criterion "${title}" is at its lowest level.`);
  return {
    complete: missing.length === 0,
    score,
    passed: missing.length === 0 && score !== null && failedRules.length === 0,
    failedRules,
    criticalFailures,
  };
}

export function isBelowFullMarks(criterion: Criterion, value: number | null | undefined) {
  return value !== null && value !== undefined && value < scaleMax(criterion.scale);
}
