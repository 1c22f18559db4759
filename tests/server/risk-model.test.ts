// The rework-risk model's server side: a fit reads each revision's first review and stores a
// new version; two servers fitting at once never both write; the hint is withheld, with its
// reason, when the history is too short; the routes per role.
import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { config } from '../../server/config';
import { RiskModel, sequelize } from '../../server/models';
import { fitAndStoreRiskModel, refitRiskModelIfDue, rescoreQueue } from '../../server/services/risk-model-service';
import { createReview, createSubmittedJob, createUser } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';
import { completeRecord, room } from '../helpers/records';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

async function reviewed(decision: 'accept' | 'rework', unflagged: number) {
  const reviewer = await createUser({ role: 'reviewer' });
  const record = completeRecord({ rooms: [room({ reflective: [{ kind: 'mirror', found: unflagged, flagged: 0 }] })] });
  const job = await createSubmittedJob({ record });
  await createReview(job, reviewer.id, decision);
  // A blind second review of the same revision is not a second outcome.
  await createReview(job, reviewer.id, 'accept', { kind: 'blind_second' });
  return job;
}

describe('fitting the model', () => {
  it('learns from first reviews only, stores a new version, and withholds the hint without enough history', async () => {
    await reviewed('rework', 2);
    await reviewed('accept', 0);
    const firsts = await sequelize.query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM (SELECT 1 FROM reviews r JOIN capture_revisions cr ON cr.job_id = r.job_id AND cr.number = r.revision_number WHERE r.kind = 'primary' GROUP BY r.job_id, r.revision_number) f",
      { type: QueryTypes.SELECT },
    );
    const before = await RiskModel.count();
    const saved = config.risk.minReviews;
    config.risk.minReviews = 1_000_000;
    try {
      const model = (await fitAndStoreRiskModel())!;
      expect(await RiskModel.count()).toBe(before + 1);
      // Fitted on each revision's first review; the blind second reviews are not counted.
      expect(model.reviews).toBeGreaterThanOrEqual(Number(firsts[0].n));
      expect(model.figures.trained + model.figures.tested).toBe(model.reviews);
      expect(model.usable).toBe(false);
      expect(model.withheld).toBe(`Not enough history yet: ${model.reviews} reviewed revisions, 1000000 needed.`);
      expect(model.coefficients).toHaveLength(model.factKeys.length + 1);
    } finally {
      config.risk.minReviews = saved;
    }
  });

  it('lets only one of two servers fit at the same moment', async () => {
    const before = await RiskModel.count();
    const results = await Promise.all([fitAndStoreRiskModel(), fitAndStoreRiskModel()]);
    const written = results.filter((r) => r !== null);
    expect(written.length).toBeGreaterThanOrEqual(1);
    expect(await RiskModel.count()).toBe(before + written.length);
    if (written.length === 2) expect(written[0]!.version).not.toBe(written[1]!.version);
  });

  it('refits on schedule only when the newest model is older than the interval', async () => {
    const saved = config.risk.fitIntervalMs;
    config.risk.fitIntervalMs = 3_600_000;
    try {
      await fitAndStoreRiskModel();
      expect(await refitRiskModelIfDue()).toBeNull();
      const later = new Date(Date.now() + 2 * 3_600_000);
      expect((await refitRiskModelIfDue(later))?.version).toBeGreaterThan(0);
    } finally {
      config.risk.fitIntervalMs = saved;
    }
  });
});

describe('the queue', () => {
  it('gives each row the probability of coming back while a usable model is in use, and none otherwise', async () => {
    const job = await createSubmittedJob({
      record: completeRecord({ rooms: [room({ reflective: [{ kind: 'mirror', found: 2, flagged: 0 }] })] }),
    });
    const { agent } = await signedInAgent(app, 'reviewer');
    const rowOf = async () =>
      (await agent.get(`/api/queue?q=${job.claimReference}`)).body.rows.find((r: { id: number }) => r.id === job.id);
    // A stand-in model: one fact, one coefficient.
    const model = await RiskModel.create({
      fittedAt: new Date(),
      reviews: 500,
      factKeys: ['unflaggedReflective'],
      coefficients: [-2, 1],
      standardErrors: [0.1, 0.1],
      figures: { trained: 400, tested: 100, auc: { estimate: 0.8, se: 0.04, low: 0.72, high: 0.88 }, brier: 0.15, reliability: [] },
      usable: true,
      withheld: null,
    });
    try {
      await rescoreQueue(model.toView());
      // logit = −2 + 1 × 2 unflagged mirrors = 0 → 50 %.
      expect((await rowOf()).risk).toBeCloseTo(0.5, 5);
      // Sorted by it, most likely first, from its own index (see the index-use test).
      const sorted = (await agent.get('/api/queue?sort=risk&dir=desc&pageSize=5')).body.rows;
      expect(sorted[0].risk).toBeGreaterThanOrEqual(0.5);
    } finally {
      await model.destroy();
    }
    await rescoreQueue(null);
    expect((await rowOf()).risk).toBeNull();
  });
});

describe('the routes', () => {
  it('gives every role the newest model, and lets a manager refit', async () => {
    for (const role of ['technician', 'reviewer', 'admin'] as const) {
      const { agent } = await signedInAgent(app, role);
      const res = await agent.get('/api/risk-model');
      expect(res.status).toBe(200);
      expect((await agent.post('/api/risk-model/fit')).status).toBe(403);
    }
    const { agent: manager } = await signedInAgent(app, 'manager');
    const fitted = await manager.post('/api/risk-model/fit');
    expect(fitted.status).toBe(201);
    expect((await manager.get('/api/risk-model')).body.model.version).toBe(fitted.body.model.version);
  });
});
