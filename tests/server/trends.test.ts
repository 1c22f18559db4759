// Trends on a small hand-built data set in two weeks of a random past year, away from every
// other test's rows (and from earlier runs on the same database). Dates below are written as
// January 2020 and shifted by whole weeks. Each expected value is worked out in the comments.
import { createApp } from '../../server/app';
import type { Job } from '../../server/models';
import { ReviewScore, Rubric, SecondReview, sequelize } from '../../server/models';
import { createJob, createReview, createUser } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
const WEEK = 7 * 86_400_000;
const SHIFT = Math.floor(Math.random() * 1200) * WEEK; // 2020-01-06 is a Monday; shifting by weeks keeps it one.
const day = (iso: string) => new Date(new Date(`${iso}T00:00:00Z`).getTime() - SHIFT).toISOString().slice(0, 10);
const PERIOD = `from=${day('2020-01-06')}&to=${day('2020-01-19')}`;
let technicianId: number;
let reviewerA: { id: number; name: string };
let reviewerB: { id: number; name: string };

const at = (iso: string, hour = 12) => new Date(new Date(`${iso}T${String(hour).padStart(2, '0')}:00:00Z`).getTime() - SHIFT);

async function review(
  job: Job,
  revision: number,
  decidedAt: Date,
  score: number,
  decision: 'accept' | 'rework' | 'recapture',
  extra: { minutes?: number; late?: boolean; reviewerId?: number; kind?: 'primary' | 'blind_second' } = {},
) {
  const rubric = await Rubric.findOne({ order: [['version', 'ASC']] });
  return createReview(job, extra.reviewerId ?? reviewerA.id, decision, {
    revisionNumber: revision,
    rubricId: rubric!.id,
    kind: extra.kind,
    score,
    claimedAt: extra.minutes ? new Date(decidedAt.getTime() - extra.minutes * 60_000) : null,
    decidedAt,
    dueAt: new Date(decidedAt.getTime() + (extra.late ? -3_600_000 : 3_600_000)),
  });
}

const below = (reviewId: number, criterionKey: string, score: number, stockReason: string | null = null) =>
  ReviewScore.create({ reviewId, criterionKey, score, maxScore: 4, stockReason, comment: 'short', carriedOver: false });

beforeAll(async () => {
  const technician = await createUser({ role: 'technician', name: 'Trend Technician' });
  technicianId = technician.id;
  const a = await createUser({ role: 'reviewer', name: 'Aa Reviewer' });
  const b = await createUser({ role: 'reviewer', name: 'Bb Reviewer' });
  reviewerA = { id: a.id, name: a.name };
  reviewerB = { id: b.id, name: b.name };
  const jobs = await Promise.all([1, 2, 3, 4, 5].map(() => createJob({ technicianId })));
  for (const job of jobs) await job.update({ siteVisitDate: day('2020-01-03') });
  const [j1, j2, j3, j4, j5] = jobs;
  // Week of 2020-01-06: four first reviews, scores 90, 80, 70, 100.
  await review(j1, 1, at('2020-01-06'), 90, 'accept', { minutes: 30 });
  const r2 = await review(j2, 1, at('2020-01-07'), 80, 'rework', { minutes: 40 });
  const r3 = await review(j3, 1, at('2020-01-07', 15), 70, 'rework', { minutes: 50, late: true });
  await review(j4, 1, at('2020-01-08'), 100, 'accept', { minutes: 60 });
  // Week of 2020-01-13: two second revisions and one first review.
  await review(j2, 2, at('2020-01-14'), 95, 'accept', { minutes: 70 });
  const r6 = await review(j3, 2, at('2020-01-15'), 60, 'recapture', { minutes: 80, late: true });
  await review(j5, 1, at('2020-01-16'), 88, 'accept', { minutes: 90 });
  await below(r2.id, 'spacing', 2, 'No doorway station');
  await below(r2.id, 'coverage', 3);
  await below(r3.id, 'spacing', 1, 'No doorway station');
  await below(r6.id, 'registration', 0);

  // Two blind pairs, both first reviews accepted by A; B agrees once and not once.
  const other = await createUser({ role: 'technician' });
  for (const [firstScore, secondScore, secondDecision, secondCoverage] of [
    [100, 95, 'accept', 4],
    [90, 70, 'rework', 3],
  ] as const) {
    const job = await createJob({ technicianId: other.id });
    const first = await review(job, 1, at('2020-01-09'), firstScore, 'accept', { reviewerId: reviewerA.id });
    const second = await review(job, 1, at('2020-01-10'), secondScore, secondDecision, { reviewerId: reviewerB.id, kind: 'blind_second' });
    await below(first.id, 'coverage', 4);
    await below(second.id, 'coverage', secondCoverage);
    await SecondReview.create({
      jobId: job.id,
      revisionNumber: 1,
      firstReviewId: first.id,
      firstReviewerId: reviewerA.id,
      secondReviewId: second.id,
      claimedById: null,
      claimExpiresAt: null,
    });
  }
});

afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

describe('GET /api/trends', () => {
  it("aggregates one technician's reviews", async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.get(`/api/trends?${PERIOD}&technicianId=${technicianId}`);
    expect(res.status).toBe(200);
    const t = res.body;
    expect(t.reviews).toBe(7);
    // Week 1: (90 + 80 + 70 + 100) / 4 = 85, 2 rework; week 2: (95 + 60 + 88) / 3 = 81, none.
    expect(t.weekly).toEqual([
      { week: day('2020-01-06'), reviews: 4, meanScore: 85, rework: 2 },
      { week: day('2020-01-13'), reviews: 3, meanScore: 81, rework: 0 },
    ]);
    // First-pass yield: first reviews accepted 3 of 5 (jobs 1, 4, 5). Wilson 95 % for 3/5:
    // (0.6 + z²/10 ± z√(0.6·0.4/5 + z²/100)) / (1 + z²/5) with z = 1.96 → 0.2307 to 0.8824.
    expect(t.firstPassYield).toMatchObject({ accepted: 3, total: 5 });
    expect(t.firstPassYield.interval.low).toBeCloseTo(0.2307, 3);
    expect(t.firstPassYield.interval.high).toBeCloseTo(0.8824, 3);
    // Accepted at revisions 1, 1, 2, 1 → 1.25. One recapture.
    expect(t.meanRevisionsToAcceptance).toBeCloseTo(1.25, 10);
    expect(t.recaptures).toBe(1);
    // Site visit 2020-01-03 00:00 to acceptances: 84, 132, 276, 348 hours → median (132 + 276) / 2 = 204.
    expect(t.medianHoursVisitToAcceptance).toBe(204);
    // p-chart: p̄ = 2 / 7; week 1 (n 4): UCL = p̄ + 3√(p̄(1−p̄)/4) = 0.2857 + 0.6776 = 0.9633, LCL floored at 0.
    expect(t.reworkChart.centre).toBeCloseTo(2 / 7, 10);
    expect(t.reworkChart.rows[0].ucl).toBeCloseTo(0.9633, 4);
    expect(t.reworkChart.rows[0].lcl).toBe(0);
    // Below full marks: spacing twice, coverage once, registration once.
    expect(
      t.paretoCriteria.map((b: { label: string; count: number; cumulativeShare: number }) => [b.label, b.count, b.cumulativeShare]),
    ).toEqual([
      ['Station spacing and doorway line of sight', 2, 0.5],
      ['Coverage completeness', 1, 0.75],
      ['Registration integrity', 1, 1],
    ]);
    expect(t.paretoReasons).toEqual([{ label: 'No doorway station', count: 2, cumulativeShare: 1 }]);
  });

  it("gives a technician their own trends and refuses anyone else's", async () => {
    const { agent, user } = await signedInAgent(app, 'technician');
    const own = await agent.get(`/api/trends?${PERIOD}`);
    expect(own.status).toBe(200);
    expect(own.body.technician.id).toBe(user.id);
    expect(own.body.reviews).toBe(0);
    expect(own.body.tooFew).toBe(true);
    expect((await agent.get(`/api/trends?${PERIOD}&technicianId=${technicianId}`)).status).toBe(403);
  });

  it('downloads the weekly table as CSV', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.get(`/api/trends?${PERIOD}&technicianId=${technicianId}&format=csv`);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.text.split('\r\n')[0]).toBe(
      'week_starting,reviews,mean_score,rework,rework_rate_pct,lower_limit_pct,upper_limit_pct,outside_limits',
    );
    expect(res.text).toContain(`${day('2020-01-06')},4,85.0,2,50.0,0.0,96.3,`);
  });

  it('refuses a period that ends before it starts', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const res = await agent.get('/api/trends?from=2020-02-01&to=2020-01-01');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('to');
  });
});

describe('GET /api/trends/team', () => {
  it('compares technicians in one row each', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const rows = (await agent.get(`/api/trends/team?${PERIOD}`)).body.rows;
    const mine = rows.find((r: { technician: { id: number } }) => r.technician.id === technicianId);
    // (90 + 80 + 70 + 100 + 95 + 60 + 88) / 7 = 583 / 7 = 83.29; rework 2 of 7.
    expect(mine.reviews).toBe(7);
    expect(mine.meanScore).toBeCloseTo(83.2857, 3);
    expect(mine.reworkRate).toBeCloseTo(2 / 7, 10);
    expect(mine.firstPassYield).toMatchObject({ accepted: 3, total: 5 });
    expect(mine.medianHoursVisitToAcceptance).toBe(204);
    expect(mine.tooFew).toBe(false);
  });
});

describe('GET /api/trends/reviewers', () => {
  it('reports reviews, median claim-to-decision time and late decisions per reviewer', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const rows = (await agent.get(`/api/trends/reviewers?${PERIOD}`)).body.rows;
    const a = rows.find((r: { reviewer: { id: number } }) => r.reviewer.id === reviewerA.id);
    // Primary reviews by A: the technician's 7 and the 2 first reviews of the blind pairs = 9.
    // Claim to decision (only where claimed): 30 … 90 minutes → median 60. Late: 2 of 9.
    expect(a).toMatchObject({ reviews: 9, medianMinutesClaimToDecision: 60 });
    expect(a.lateShare).toBeCloseTo(2 / 9, 10);
  });
});

describe('GET /api/trends/calibration', () => {
  it('measures agreement on blind double reviews', async () => {
    const { agent } = await signedInAgent(app, 'manager');
    const c = (await agent.get(`/api/trends/calibration?${PERIOD}`)).body;
    expect(c.pairs).toBe(2);
    // Decisions: (accept, accept) and (accept, rework): the first reviewer used one category only,
    // so p_o = p_e = 0.5 and the formula's 0 ("slight") would mean nothing: kappa is not defined.
    expect(c.decisions.kappa).toBeNull();
    expect(c.decisions.band).toBeNull();
    expect(c.decisions.table[0]).toEqual([1, 1, 0]);
    // Coverage scores (4, 4) and (4, 3): the first reviewer gave 4 only, so κw is not defined either.
    expect(c.criterionScores.kappa).toBeNull();
    // |100 − 95| and |90 − 70| → (5 + 20) / 2 = 12.5.
    expect(c.meanAbsoluteScoreDifference).toBeCloseTo(12.5, 10);
    expect(c.reviewerPairs).toEqual([{ reviewers: ['Aa Reviewer', 'Bb Reviewer'], n: 2, decisionKappa: null, band: null }]);
  });
});
