// The logistic regression fit and the hold-out figures, against outside values:
// - the "hours of study and passing an exam" example of the Wikipedia article "Logistic
//   regression" (20 students), whose fitted coefficients are printed as −4.0777 (SE 1.7610) for
//   the intercept and 1.5046 (SE 0.6287) per hour (values quoted from memory of that table);
// - a synthetic data set drawn from known coefficients, recovered within tolerance;
// - AUC and Brier recomputed by hand from their definitions on a tiny data set, and the
//   Hanley & McNeil (1982) standard error formula.
import { fitLogistic } from '@/shared/logistic';
import { predictProbability } from '@/shared/logistic-predict';
import { auc, aucInterval, brierScore, reliabilityTable } from '@/shared/model-metrics';

const HOURS = [0.5, 0.75, 1, 1.25, 1.5, 1.75, 1.75, 2, 2.25, 2.5, 2.75, 3, 3.25, 3.5, 4, 4.25, 4.5, 4.75, 5, 5.5];
const PASSED = [0, 0, 0, 0, 0, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1, 1];

describe('logistic regression fit', () => {
  it('reproduces the published hours-of-study example (no penalty)', () => {
    const fit = fitLogistic(
      HOURS.map((h) => [h]),
      PASSED,
    );
    expect(fit.converged).toBe(true);
    expect(fit.coefficients[0]).toBeCloseTo(-4.0777, 3);
    expect(fit.coefficients[1]).toBeCloseTo(1.5046, 3);
    expect(fit.standardErrors[0]).toBeCloseTo(1.761, 2);
    expect(fit.standardErrors[1]).toBeCloseTo(0.6287, 3);
    // The article's reading: 2 hours of study → a 26 % chance of passing.
    expect(predictProbability(fit.coefficients, [2])).toBeCloseTo(0.26, 2);
  });

  it('recovers known coefficients from a synthetic data set', () => {
    let seed = 7;
    const rand = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
    const truth = [-1, 0.8, -0.5];
    const X: number[][] = [];
    const y: number[] = [];
    for (let i = 0; i < 6000; i++) {
      const x = [Math.floor(rand() * 4), rand() < 0.5 ? 1 : 0];
      X.push(x);
      y.push(rand() < predictProbability(truth, x) ? 1 : 0);
    }
    const fit = fitLogistic(X, y, { lambda: 0 });
    fit.coefficients.forEach((b, j) => expect(Math.abs(b - truth[j])).toBeLessThan(3 * fit.standardErrors[j] + 0.02));
  });

  it('shrinks coefficients, not the intercept, as the penalty grows', () => {
    const free = fitLogistic(
      HOURS.map((h) => [h]),
      PASSED,
    );
    const shrunk = fitLogistic(
      HOURS.map((h) => [h]),
      PASSED,
      { lambda: 10 },
    );
    expect(Math.abs(shrunk.coefficients[1])).toBeLessThan(Math.abs(free.coefficients[1]));
  });
});

describe('hold-out figures', () => {
  // Came back: 0.9, 0.6, 0.4; did not: 0.7, 0.3, 0.2, 0.1. Pairs won: 0.9 beats all 4, 0.6 beats
  // 3, 0.4 beats 3 → 10 of 12 → AUC = 0.8333.
  const p = [0.9, 0.6, 0.4, 0.7, 0.3, 0.2, 0.1];
  const y = [1, 1, 1, 0, 0, 0, 0];

  it('computes AUC from its definition, ties counting half', () => {
    expect(auc(p, y)).toBeCloseTo(10 / 12, 12);
    expect(auc([0.5, 0.5], [1, 0])).toBe(0.5);
    expect(auc([0.5], [1])).toBeNull();
  });

  it('gives the Hanley & McNeil interval', () => {
    // A = 0.8333, n1 = 3, n2 = 4: Q1 = 0.7143, Q2 = 0.7576;
    // var = (0.1389 + 2 × 0.0198 + 3 × 0.0631) / 12 = 0.0306 → SE = 0.1750.
    const interval = aucInterval(10 / 12, 3, 4);
    expect(interval.se).toBeCloseTo(0.175, 3);
    expect(interval.low).toBeCloseTo(10 / 12 - 1.96 * interval.se, 12);
    expect(interval.high).toBe(1);
  });

  it('computes the Brier score from its definition', () => {
    // (0.01 + 0.16 + 0.36 + 0.49 + 0.09 + 0.04 + 0.01) / 7 = 1.16 / 7.
    expect(brierScore(p, y)).toBeCloseTo(1.16 / 7, 12);
  });

  it('groups records into deciles of predicted probability', () => {
    const probabilities = Array.from({ length: 20 }, (_, i) => i / 20);
    const outcomes = probabilities.map((q) => (q >= 0.5 ? 1 : 0));
    const table = reliabilityTable(probabilities, outcomes);
    expect(table).toHaveLength(10);
    expect(table[0]).toEqual({ group: 1, n: 2, meanPredicted: 0.025, observed: 0 });
    expect(table[9]).toEqual({ group: 10, n: 2, meanPredicted: 0.925, observed: 1 });
  });
});
