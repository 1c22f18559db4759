// Statistics for the quality trends. Where a well-known package has the function we use it
// (simple-statistics for mean, SD and median; jstat for the normal quantile); the rest —
// Wilson intervals, p-chart limits, kappa — no common package offers, so they live here and
// are checked against published worked examples in tests/shared/statistics.test.ts.
import { jStat } from 'jstat';
import { mean as ssMean, median as ssMedian, sampleStandardDeviation } from 'simple-statistics';

export const Z_95 = jStat.normal.inv(0.975, 0, 1);

export const mean = (values: number[]) => (values.length ? ssMean(values) : null);
export const sampleSd = (values: number[]) => (values.length > 1 ? sampleStandardDeviation(values) : null);
export const median = (values: number[]) => (values.length ? ssMedian(values) : null);

export type Interval = { estimate: number; low: number; high: number };

// Wilson score interval without continuity correction (Wilson 1927; Newcombe 1998, method 3).
export function wilsonInterval(successes: number, n: number, z = Z_95): Interval | null {
  if (n <= 0) return null;
  const p = successes / n;
  const z2 = z * z;
  const centre = p + z2 / (2 * n);
  const spread = z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  const denominator = 1 + z2 / n;
  return { estimate: p, low: Math.max(0, (centre - spread) / denominator), high: Math.min(1, (centre + spread) / denominator) };
}

export type PChartPoint = { label: string; n: number; defects: number };
export type PChartRow = PChartPoint & { p: number; lcl: number; ucl: number; outside: 'above' | 'below' | null };

// Proportion control chart with 3-sigma limits computed per point from that point's n
// (NIST/SEMATECH e-Handbook of Statistical Methods, §6.3.3.2). LCL is floored at 0, UCL capped at 1.
export function pChart(points: PChartPoint[]): { centre: number | null; rows: PChartRow[] } {
  const totalN = points.reduce((s, p) => s + p.n, 0);
  if (totalN === 0) return { centre: null, rows: [] };
  const centre = points.reduce((s, p) => s + p.defects, 0) / totalN;
  const rows = points
    .filter((p) => p.n > 0)
    .map((point) => {
      const sigma = Math.sqrt((centre * (1 - centre)) / point.n);
      const lcl = Math.max(0, centre - 3 * sigma);
      const ucl = Math.min(1, centre + 3 * sigma);
      const p = point.defects / point.n;
      return { ...point, p, lcl, ucl, outside: p > ucl ? ('above' as const) : p < lcl ? ('below' as const) : null };
    });
  return { centre, rows };
}

export type Kappa = { observed: number; expected: number; kappa: number };

// Cohen's kappa from a square table of counts or proportions (rows: rater A, columns: rater B).
// weights: null for the unweighted statistic, 'linear' or 'quadratic' agreement weights over
// ordered categories, or a matrix of disagreement weights (Cohen 1968).
export function cohenKappa(table: number[][], weights: null | 'linear' | 'quadratic' | number[][] = null): Kappa | null {
  const k = table.length;
  const total = table.flat().reduce((s, v) => s + v, 0);
  if (k < 2 || total === 0) return null;
  const p = table.map((row) => row.map((v) => v / total));
  const rows = p.map((row) => row.reduce((s, v) => s + v, 0));
  const cols = p[0].map((_, j) => p.reduce((s, row) => s + row[j], 0));
  // With one rater always giving the same category, chance agreement is the observed one and
  // kappa says nothing (it would read 0, "slight"): not defined.
  if (rows.filter((r) => r > 0).length < 2 || cols.filter((c) => c > 0).length < 2) return null;
  // Disagreement weight v_ij: 0 on the diagonal.
  const v = (i: number, j: number) =>
    weights === null
      ? i === j
        ? 0
        : 1
      : weights === 'linear'
        ? Math.abs(i - j) / (k - 1)
        : weights === 'quadratic'
          ? ((i - j) / (k - 1)) ** 2
          : weights[i][j];
  let observedDisagreement = 0;
  let expectedDisagreement = 0;
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      observedDisagreement += v(i, j) * p[i][j];
      expectedDisagreement += v(i, j) * rows[i] * cols[j];
    }
  }
  if (expectedDisagreement === 0) return null;
  const kappa = 1 - observedDisagreement / expectedDisagreement;
  // Reported as agreement proportions, which equal 1 − disagreement for unweighted tables.
  const maxV = Math.max(...Array.from({ length: k }, (_, i) => Array.from({ length: k }, (_, j) => v(i, j))).flat());
  return { observed: 1 - observedDisagreement / maxV, expected: 1 - expectedDisagreement / maxV, kappa };
}

// Landis & Koch (1977) Biometrics 33:159–174, bands of agreement for kappa.
export function landisKoch(kappa: number): string {
  if (kappa < 0) return 'Poor';
  if (kappa <= 0.2) return 'Slight';
  if (kappa <= 0.4) return 'Fair';
  if (kappa <= 0.6) return 'Moderate';
  if (kappa <= 0.8) return 'Substantial';
  return 'Almost perfect';
}

// The median of values given as (value, count) pairs, without expanding them: the middle
// value, or the mean of the two middle ones for an even total (as MariaDB's MEDIAN does).
export function medianOfCounts(counts: { value: number; n: number }[]): number | null {
  const sorted = counts.filter((c) => c.n > 0).sort((a, b) => a.value - b.value);
  const total = sorted.reduce((s, c) => s + c.n, 0);
  if (total === 0) return null;
  const at = (rank: number) => {
    let seen = 0;
    for (const c of sorted) {
      seen += c.n;
      if (rank < seen) return c.value;
    }
    return sorted[sorted.length - 1].value;
  };
  const middle = Math.floor(total / 2);
  return total % 2 ? at(middle) : (at(middle - 1) + at(middle)) / 2;
}
