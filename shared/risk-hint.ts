// The rework-risk hint: the stored model's probability for this record, the facts that raise
// it most, and what would lower it. Shown only when the model earned it on held-out records;
// otherwise it says so and gives no number.
import { predictProbability } from './logistic-predict';
import { RISK_FACTS } from './risk-facts';

export type RiskFigures = {
  trained: number;
  tested: number;
  auc: { estimate: number; se: number; low: number; high: number } | null;
  brier: number | null;
  reliability: { group: number; n: number; meanPredicted: number; observed: number }[];
};

export type RiskModelView = {
  version: number;
  fittedAt: string;
  reviews: number;
  // Facts in the order of the coefficients after the intercept.
  factKeys: string[];
  coefficients: number[];
  standardErrors: number[];
  figures: RiskFigures;
  usable: boolean;
  // Why the hint is not shown, in words, when it is not.
  withheld: string | null;
};

export const MIN_AUC_LOWER_BOUND = 0.6;

export type RiskHint = { kind: 'withheld'; message: string } | { kind: 'hint'; probability: number; raising: string[]; lowering: string[] };

export function usability(reviews: number, minReviews: number, aucLow: number | null): string | null {
  if (reviews < minReviews) return `Not enough history yet: ${reviews} reviewed revisions, ${minReviews} needed.`;
  if (aucLow === null || aucLow <= MIN_AUC_LOWER_BOUND)
    return 'Not enough history yet: on records it had not seen, the model did not tell well enough which came back.';
  return null;
}

// facts: the record's facts in RISK_FACTS order (riskFacts).
export function riskHint(model: RiskModelView | null, facts: number[]): RiskHint {
  if (!model) return { kind: 'withheld', message: 'Not enough history yet: no model has been fitted.' };
  if (!model.usable) return { kind: 'withheld', message: model.withheld ?? 'Not enough history yet.' };
  const byKey = new Map(RISK_FACTS.map((f, i) => [f.key, { def: f, value: facts[i] ?? 0 }]));
  const x = model.factKeys.map((key) => byKey.get(key)?.value ?? 0);
  const probability = predictProbability(model.coefficients, x);
  const contributions = model.factKeys
    .map((key, j) => ({ key, value: x[j], effect: model.coefficients[j + 1] * x[j] }))
    .filter((c) => c.value > 0 && c.effect > 0)
    .sort((a, b) => b.effect - a.effect)
    .slice(0, 3);
  const raising = contributions.map((c) => byKey.get(c.key)!.def.words(c.value));
  const lowering = contributions.map((c) => byKey.get(c.key)!.def.lower).filter((t): t is string => t !== null);
  return { kind: 'hint', probability, raising, lowering };
}

export function hintSentence(probability: number): string {
  return `Records like this one came back ${Math.round(probability * 100)} % of the time.`;
}

// Odds ratio per fact with its 95 % interval (Wald, exp(β ± 1.96 SE)).
export function oddsRatios(model: Pick<RiskModelView, 'factKeys' | 'coefficients' | 'standardErrors'>) {
  return model.factKeys.map((key, j) => {
    const b = model.coefficients[j + 1];
    const se = model.standardErrors[j + 1];
    return { key, ratio: Math.exp(b), low: Math.exp(b - 1.96 * se), high: Math.exp(b + 1.96 * se) };
  });
}

export function riskProbability(model: RiskModelView | null, facts: number[]): number | null {
  const hint = riskHint(model, facts);
  return hint.kind === 'hint' ? hint.probability : null;
}

// The queue's words for a probability: never colour alone, always the number too.
export function riskWords(probability: number | null): string {
  if (probability === null) return '—';
  const word = probability >= 0.5 ? 'Likely' : probability >= 0.25 ? 'Possibly' : 'Unlikely';
  return `${word} (${Math.round(probability * 100)} %)`;
}
