// Fits the rework-risk model on past reviews and measures it honestly: trained on the earlier
// 80 % of reviews, tested on the later 20 % it never saw, then refitted on all of them for use.
import { fitLogistic } from './logistic';
import { predictProbability } from './logistic-predict';
import { auc, aucInterval, brierScore, reliabilityTable } from './model-metrics';
import { RISK_FACTS } from './risk-facts';
import { type RiskModelView, usability } from './risk-hint';

export type TrainingRow = { facts: number[]; cameBack: 0 | 1; decidedAt: string };

export const DEFAULT_LAMBDA = 1;

const bothOutcomes = (rows: TrainingRow[]) => rows.some((r) => r.cameBack === 1) && rows.some((r) => r.cameBack === 0);

export function fitRiskModel(
  rows: TrainingRow[],
  options: { minReviews: number; lambda?: number },
): Omit<RiskModelView, 'version' | 'fittedAt'> {
  const lambda = options.lambda ?? DEFAULT_LAMBDA;
  const ordered = [...rows].sort((a, b) => a.decidedAt.localeCompare(b.decidedAt));
  const cut = Math.floor(ordered.length * 0.8);
  const train = ordered.slice(0, cut);
  const test = ordered.slice(cut);
  let figures: RiskModelView['figures'] = { trained: train.length, tested: test.length, auc: null, brier: null, reliability: [] };
  if (bothOutcomes(train) && bothOutcomes(test)) {
    const held = fitLogistic(
      train.map((r) => r.facts),
      train.map((r) => r.cameBack),
      { lambda },
    );
    const predicted = test.map((r) => predictProbability(held.coefficients, r.facts));
    const outcomes = test.map((r) => r.cameBack);
    const area = auc(predicted, outcomes)!;
    figures = {
      ...figures,
      auc: aucInterval(area, outcomes.filter((y) => y === 1).length, outcomes.filter((y) => y === 0).length),
      brier: brierScore(predicted, outcomes),
      reliability: reliabilityTable(predicted, outcomes),
    };
  }
  const k = RISK_FACTS.length + 1;
  const final = bothOutcomes(ordered)
    ? fitLogistic(
        ordered.map((r) => r.facts),
        ordered.map((r) => r.cameBack),
        { lambda },
      )
    : { coefficients: new Array<number>(k).fill(0), standardErrors: new Array<number>(k).fill(0) };
  const withheld = usability(ordered.length, options.minReviews, figures.auc?.low ?? null);
  return {
    reviews: ordered.length,
    factKeys: RISK_FACTS.map((f) => f.key),
    coefficients: final.coefficients,
    standardErrors: final.standardErrors,
    figures,
    usable: withheld === null,
    withheld,
  };
}
