// The rework-risk model end to end on synthetic reviews: facts from a record, the time-ordered
// hold-out, the "not enough history" path, and the hint's words. The fitting itself is checked
// against a published example in logistic.test.ts.
import { predictProbability } from '@/shared/logistic-predict';
import { RISK_FACTS, riskFacts } from '@/shared/risk-facts';
import { fitRiskModel, type TrainingRow } from '@/shared/risk-fit';
import { hintSentence, oddsRatios, riskHint, type RiskModelView } from '@/shared/risk-hint';
import { feetToMetres } from '@/shared/units';

import { completeRecord, room } from '../helpers/records';

const index = (key: string) => RISK_FACTS.findIndex((f) => f.key === key);
const job = { lossType: 'water' as const, propertyType: 'single_family' as const };

// Records whose chance of coming back rises with unflagged mirrors and missing doorway stations.
function synthetic(n: number, signal = true, seed = 11): TrainingRow[] {
  let s = seed;
  const rand = () => (s = (s * 48271) % 2147483647) / 2147483647;
  return Array.from({ length: n }, (_, i) => {
    const facts = new Array<number>(RISK_FACTS.length).fill(0);
    facts[index('unflaggedReflective')] = Math.floor(rand() * 3);
    facts[index('noDoorwayStation')] = Math.floor(rand() * 3);
    facts[index('rooms')] = 3 + Math.floor(rand() * 5);
    const p = signal ? predictProbability([-2.2, 1.3, 0.9], [facts[index('unflaggedReflective')], facts[index('noDoorwayStation')]]) : 0.3;
    return { facts, cameBack: rand() < p ? 1 : 0, decidedAt: new Date(Date.UTC(2025, 0, 1) + i * 3_600_000).toISOString() };
  });
}

const asView = (fit: ReturnType<typeof fitRiskModel>): RiskModelView => ({ ...fit, version: 1, fittedAt: '2026-12-01T00:00:00.000Z' });

describe('facts of a record', () => {
  it('counts what a reviewer would send back for, and nothing about the technician', () => {
    const record = completeRecord({
      rooms: [
        room({
          lengthM: feetToMetres(12),
          widthM: feetToMetres(15),
          stations: 3,
          doorwayStation: false,
          reflective: [{ kind: 'mirror', found: 2, flagged: 0 }],
        }),
      ],
      gaps: [{ key: 'g', location: 'Attic', cause: 'unsafe', resolved: false, note: '' }],
    });
    const facts = riskFacts(record, null, job, 2);
    expect(facts[index('unflaggedReflective')]).toBe(2);
    expect(facts[index('noDoorwayStation')]).toBe(1);
    // 180 ft² at 6 ft → 5 expected, 3 taken (common practice spacing).
    expect(facts[index('roomsShort')]).toBe(1);
    expect(facts[index('unresolvedGaps')]).toBe(1);
    expect(facts[index('noStationFile')]).toBe(1);
    expect(facts[index('resubmission')]).toBe(1);
    expect(RISK_FACTS.map((f) => f.key).some((k) => /technician|person|user/i.test(k))).toBe(false);
  });
});

describe('fit and hold-out', () => {
  it('finds the structure of synthetic reviews and earns the hint on the later 20 %', () => {
    const fit = fitRiskModel(synthetic(600), { minReviews: 200 });
    expect(fit.figures).toMatchObject({ trained: 480, tested: 120 });
    expect(fit.figures.auc!.low).toBeGreaterThan(0.6);
    expect(fit.usable).toBe(true);
    expect(fit.coefficients[index('unflaggedReflective') + 1]).toBeGreaterThan(0.8);
    const ratios = oddsRatios(fit);
    const mirror = ratios.find((r) => r.key === 'unflaggedReflective')!;
    expect(mirror.low).toBeLessThan(mirror.ratio);
    expect(mirror.ratio).toBeLessThan(mirror.high);
    expect(fit.figures.reliability.reduce((s, r) => s + r.n, 0)).toBe(120);
  });

  it('withholds the hint with too few reviews, saying so', () => {
    const fit = fitRiskModel(synthetic(150), { minReviews: 200 });
    expect(fit.usable).toBe(false);
    expect(riskHint(asView(fit), new Array(RISK_FACTS.length).fill(0))).toEqual({
      kind: 'withheld',
      message: 'Not enough history yet: 150 reviewed revisions, 200 needed.',
    });
  });

  it('withholds the hint when the outcomes carry no signal', () => {
    const fit = fitRiskModel(synthetic(600, false), { minReviews: 200 });
    expect(fit.usable).toBe(false);
    expect(fit.withheld).toMatch(/did not tell well enough/);
  });
});

describe('the hint', () => {
  it('names the facts that raise it most, and what would lower them', () => {
    const model = asView(fitRiskModel(synthetic(600), { minReviews: 200 }));
    const facts = new Array<number>(RISK_FACTS.length).fill(0);
    facts[index('unflaggedReflective')] = 2;
    facts[index('rooms')] = 4;
    const hint = riskHint(model, facts);
    if (hint.kind !== 'hint') throw new Error('expected a hint');
    expect(hint.raising[0]).toBe('2 reflective surfaces found but not flagged');
    expect(hint.lowering[0]).toBe('Flag every mirror and glass surface you found.');
    const flagged = riskHint(
      model,
      facts.map((v, i) => (i === index('unflaggedReflective') ? 0 : v)),
    );
    if (flagged.kind !== 'hint') throw new Error('expected a hint');
    expect(flagged.probability).toBeLessThan(hint.probability);
    expect(hintSentence(0.381)).toBe('Records like this one came back 38 % of the time.');
  });
});
