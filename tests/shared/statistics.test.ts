import { cohenKappa, landisKoch, mean, pChart, sampleSd, wilsonInterval, Z_95 } from '../../shared/statistics';
import strdFile from '../fixtures/nist-strd-univariate.json';

type Strd = { certified: Record<string, { mean: number; sd: number }>; data: Record<string, number[]> };
const strd = strdFile as unknown as Strd;

const closeRel = (actual: number, expected: number, tolerance: number) =>
  expect(Math.abs(actual - expected) / Math.max(Math.abs(expected), 1e-300)).toBeLessThan(tolerance);

describe('mean and sample SD against NIST StRD certified values', () => {
  // Source: NIST ITL Statistical Reference Datasets, Univariate Summary Statistics (copied into tests/fixtures).
  for (const name of ['Lew', 'Lottery', 'Mavro', 'Michelso', 'NumAcc1', 'PiDigits']) {
    it(`matches ${name} to a relative 1e-12`, () => {
      closeRel(mean(strd.data[name])!, strd.certified[name].mean, 1e-12);
      closeRel(sampleSd(strd.data[name])!, strd.certified[name].sd, 1e-12);
    });
  }
});

describe('Wilson score interval (95 %, no continuity correction)', () => {
  // Source: Newcombe (1998) Stat. Med. 17:857–872, Table I, method 3 (Wilson 1927);
  // values from memory, recomputed to 4 dp with z = 1.959964 (REFERENCES.md).
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0.0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])('%i of %i gives %f to %f', (x, n, low, high) => {
    const ci = wilsonInterval(x, n)!;
    expect(ci.low).toBeCloseTo(low, 4);
    expect(ci.high).toBeCloseTo(high, 4);
  });

  it('uses z from jstat, not a coarse approximation', () => {
    expect(Z_95).toBeCloseTo(1.959963984540054, 12);
  });
});

describe('p-chart limits', () => {
  // Source: NIST/SEMATECH e-Handbook §6.3.3.2 (30 wafers × 50 chips, p̄ = 0.2313):
  // limits derived from the formula p̄ ± 3√(p̄(1−p̄)/n): UCL 0.4102, LCL 0.0524.
  it('reproduces the handbook limits for n = 50', () => {
    // 30 samples of 50 whose defects total 347 (17 × 12 + 13 × 11): p̄ = 347 / 1500 = 0.23133.
    const points = Array.from({ length: 30 }, (_, i) => ({ label: `w${i + 1}`, n: 50, defects: i < 17 ? 12 : 11 }));
    const { centre, rows } = pChart(points);
    expect(centre).toBeCloseTo(0.2313, 4);
    expect(rows[0].ucl).toBeCloseTo(0.4102, 3);
    expect(rows[0].lcl).toBeCloseTo(0.0524, 3);
  });

  it("computes limits per point from that point's n and calls out points outside them", () => {
    const { rows } = pChart([
      { label: 'a', n: 10, defects: 1 },
      { label: 'b', n: 40, defects: 4 },
      { label: 'c', n: 10, defects: 9 },
    ]);
    // p̄ = 14 / 60; with n = 10 the band is wider than with n = 40.
    expect(rows[0].ucl - rows[0].lcl).toBeGreaterThan(rows[1].ucl - rows[1].lcl);
    expect(rows.map((r) => r.outside)).toEqual([null, null, 'above']);
  });
});

describe("Cohen's kappa", () => {
  it('2×2 textbook example: p_o 0.70, p_e 0.50, κ 0.40', () => {
    // Source: widely reproduced example (Wikipedia "Cohen's kappa"); verified in REFERENCES.md.
    const k = cohenKappa([
      [20, 5],
      [10, 15],
    ])!;
    expect(k.observed).toBeCloseTo(0.7, 10);
    expect(k.expected).toBeCloseTo(0.5, 10);
    expect(k.kappa).toBeCloseTo(0.4, 10);
  });

  it('Cohen (1968) 3×3 proportions: κ 0.4915, weighted κ 0.3478 with his disagreement weights', () => {
    // Source: Cohen (1968) Psychol. Bull. 70:213–220.
    const table = [
      [0.44, 0.07, 0.09],
      [0.05, 0.2, 0.05],
      [0.01, 0.03, 0.06],
    ];
    expect(cohenKappa(table)!.kappa).toBeCloseTo(0.4915, 4);
    expect(
      cohenKappa(table, [
        [0, 1, 3],
        [1, 0, 6],
        [3, 6, 0],
      ])!.kappa,
    ).toBeCloseTo(0.3478, 4);
  });

  it('linear and quadratic weights: 0.9315, 0.9412, 0.9541', () => {
    // Source: scikit-learn cohen_kappa_score test values; Artstein & Poesio (2008).
    const table = [
      [46, 0, 0],
      [4, 40, 0],
      [0, 0, 10],
    ];
    expect(cohenKappa(table)!.kappa).toBeCloseTo(0.9315, 4);
    expect(cohenKappa(table, 'linear')!.kappa).toBeCloseTo(0.9412, 4);
    expect(cohenKappa(table, 'quadratic')!.kappa).toBeCloseTo(0.9541, 4);
  });

  it('SAS example quoted in statsmodels: κ 0.4842, linear κw 0.4701', () => {
    const table = [
      [0, 4, 1],
      [0, 8, 0],
      [0, 1, 5],
    ];
    expect(cohenKappa(table)!.kappa).toBeCloseTo(0.4842, 4);
    expect(cohenKappa(table, 'linear')!.kappa).toBeCloseTo(0.4701, 4);
  });

  it('is not defined when one rater used a single category (a table with one non-empty row)', () => {
    // Every first decision "accept", the second reviewer sometimes "rework": p_o = p_e, so the
    // formula gives 0 ("slight") though the table cannot measure agreement at all.
    expect(
      cohenKappa([
        [45, 5, 0],
        [0, 0, 0],
        [0, 0, 0],
      ]),
    ).toBeNull();
    expect(
      cohenKappa([
        [45, 0],
        [5, 0],
      ]),
    ).toBeNull();
  });

  it('names the Landis & Koch (1977) bands', () => {
    expect([-0.1, 0.1, 0.3, 0.5, 0.7, 0.9].map(landisKoch)).toEqual([
      'Poor',
      'Slight',
      'Fair',
      'Moderate',
      'Substantial',
      'Almost perfect',
    ]);
  });
});
