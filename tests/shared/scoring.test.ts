import * as fc from 'fast-check';

import type { Criterion, RubricDefinition } from '../../shared/rubric';
import { evaluate, type ScoreSheet, weightedScore } from '../../shared/scoring';

const levels: Criterion['scale'] = { kind: 'levels', levels: ['None', 'Poor', 'Fair', 'Good', 'Full'] };
const passFail: Criterion['scale'] = { kind: 'pass_fail' };
const criterion = (key: string, weight: number, extra: Partial<Criterion> = {}): Criterion => ({
  key,
  title: key,
  guidance: '',
  weight,
  scale: levels,
  critical: false,
  appliesWhen: 'always',
  stockReasons: [],
  ...extra,
});

describe('weightedScore (worked by hand)', () => {
  it('weights scores by their criteria', () => {
    // Weights 50, 30, 20; scores 4/4, 2/4, pass (1/1).
    // 100 × (50×1 + 30×0.5 + 20×1) / 100 = 100 × 85 / 100 = 85.0
    const criteria = [criterion('a', 50), criterion('b', 30), criterion('c', 20, { scale: passFail })];
    expect(weightedScore(criteria, { a: 4, b: 2, c: 1 })).toBe(85);
  });

  it('drops a not-applicable criterion and renormalises the rest', () => {
    // c is N/A: 100 × (50×1 + 30×0.5) / (50 + 30) = 100 × 65 / 80 = 81.25 → 81.3 (half up)
    const criteria = [criterion('a', 50), criterion('b', 30), criterion('c', 20)];
    expect(weightedScore(criteria, { a: 4, b: 2, c: null })).toBe(81.3);
  });

  it('rounds exact halves up where floating point would round down', () => {
    // Weights 3 and 1, a = 1/4, b = 0: 100 × (3 × 0.25) / 4 = 18.75 → 18.8 (half up), not 18.7.
    const criteria = [criterion('a', 3), criterion('b', 1)];
    expect(weightedScore(criteria, { a: 1, b: 0 })).toBe(18.8);
    // 84.95 exactly: weights 1699 and 301 (sum 2000) with a = 4/4 and b = 0 → 100 × 1699/2000 = 84.95 → 85.0
    expect(weightedScore([criterion('a', 1699), criterion('b', 301)], { a: 4, b: 0 })).toBe(85);
  });

  it('has no score when nothing applicable is scored', () => {
    expect(weightedScore([criterion('a', 10)], { a: null })).toBeNull();
  });
});

describe('evaluate', () => {
  const rubric: RubricDefinition = {
    passMark: 85,
    criteria: [criterion('coverage', 40, { critical: true, title: 'Coverage' }), criterion('spacing', 60)],
  };

  it('passes at or above the pass mark with no critical failure', () => {
    // 100 × (40×1 + 60×0.75) / 100 = 85.0 → pass (≥ 85)
    expect(evaluate(rubric, { coverage: 4, spacing: 3 })).toMatchObject({ score: 85, passed: true, failedRules: [] });
  });

  it('fails below the pass mark and says so', () => {
    // 100 × (40×1 + 60×0.5) / 100 = 70.0
    expect(evaluate(rubric, { coverage: 4, spacing: 2 })).toMatchObject({
      score: 70,
      passed: false,
      failedRules: ['Score 70.0 is below the pass mark of 85.'],
    });
  });

  it('fails on a critical criterion at its lowest level whatever the total', () => {
    const high: RubricDefinition = {
      passMark: 50,
      criteria: [criterion('coverage', 5, { critical: true, title: 'Coverage' }), criterion('spacing', 95)],
    };
    // 100 × (0 + 95) / 100 = 95.0, above 50, but Coverage is 0 and critical.
    expect(evaluate(high, { coverage: 0, spacing: 4 })).toMatchObject({
      score: 95,
      passed: false,
      failedRules: ['Critical criterion "Coverage" is at its lowest level.'],
    });
  });

  it('is incomplete, and not passed, until every criterion is scored or not applicable', () => {
    expect(evaluate(rubric, { coverage: 4 })).toMatchObject({ complete: false, passed: false });
  });
});

describe('weightedScore properties (fast-check)', () => {
  const sheetArb = fc
    .array(
      fc.record({
        weight: fc.integer({ min: 1, max: 100 }),
        passFail: fc.boolean(),
        score: fc.option(fc.integer({ min: 0, max: 4 }), { nil: null }),
      }),
      { minLength: 1, maxLength: 12 },
    )
    .map((rows) => {
      const criteria = rows.map((r, i) => criterion(`k${i}`, r.weight, { scale: r.passFail ? passFail : levels }));
      const sheet: ScoreSheet = Object.fromEntries(
        rows.map((r, i) => [`k${i}`, r.score === null ? null : r.passFail ? Math.min(r.score, 1) : r.score]),
      );
      return { criteria, sheet };
    });

  it('stays within 0–100', () => {
    fc.assert(
      fc.property(sheetArb, ({ criteria, sheet }) => {
        const score = weightedScore(criteria, sheet);
        return score === null || (score >= 0 && score <= 100);
      }),
    );
  });

  it('does not change when every weight is scaled by the same constant', () => {
    fc.assert(
      fc.property(sheetArb, fc.integer({ min: 2, max: 50 }), ({ criteria, sheet }, k) => {
        const scaled = criteria.map((c) => ({ ...c, weight: c.weight * k }));
        return weightedScore(scaled, sheet) === weightedScore(criteria, sheet);
      }),
    );
  });

  it("never goes down when one criterion's score goes up", () => {
    fc.assert(
      fc.property(sheetArb, fc.nat(), ({ criteria, sheet }, pick) => {
        const c = criteria[pick % criteria.length];
        const current = sheet[c.key];
        const max = c.scale.kind === 'levels' ? 4 : 1;
        if (current === null || current === undefined || current >= max) return true;
        const raised = { ...sheet, [c.key]: current + 1 };
        return (weightedScore(criteria, raised) ?? 0) >= (weightedScore(criteria, sheet) ?? 0);
      }),
    );
  });
});
