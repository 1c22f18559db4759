// The weekly trend rollups must equal the raw aggregates they stand for. A random series of
// decisions (through the API, so in the decision's own transaction, and as history rows at
// past dates) is compared table by table with the GROUP BY over the raw reviews and scores
// (server/trends/rollup-sql.ts), restricted to this test's own people.
import { QueryTypes } from 'sequelize';

import { createApp } from '../../server/app';
import { ReviewScore, Rubric, sequelize } from '../../server/models';
import { ROLLUP_SOURCES } from '../../server/trends/rollup-sql';
import { claimFor, createJob, createReview, createSubmittedJob, createUser, fullScores } from '../helpers/factories';
import { resetSignInLimits, signedInAgent } from '../helpers/http';

const app = createApp();
afterAll(async () => {
  await resetSignInLimits();
  await sequelize.close();
});

// A small deterministic generator (mulberry32), so a failure can be replayed from its seed.
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const SEED = Date.now() % 100_000;
const rand = random(SEED);
const pick = <T>(items: readonly T[]) => items[Math.floor(rand() * items.length)];

async function rowsOf(sql: string) {
  const rows = await sequelize.query<Record<string, unknown>>(sql, { type: QueryTypes.SELECT });
  return rows
    .map((row) =>
      Object.fromEntries(Object.entries(row).map(([k, v]) => [k, v instanceof Date ? v.toISOString().slice(0, 10) : String(v)])),
    )
    .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b)));
}

// Dozens of decisions, each with its timeline, e-mail and notices: more than the default 5 s.
it(`equals the raw aggregates after a random series of decisions (seed ${SEED})`, async () => {
  const technicians = await Promise.all([1, 2, 3].map(() => createUser({ role: 'technician' })));
  const { agent, user: reviewer } = await signedInAgent(app, 'reviewer');
  const otherReviewer = await createUser({ role: 'reviewer' });
  const rubric = (await Rubric.findOne({ order: [['version', 'DESC']] }))!;

  // Decisions through the API: accept at full marks, or rework with one to three criteria short.
  for (let i = 0; i < 12; i++) {
    const job = await claimFor(await createSubmittedJob({ technicianId: pick(technicians).id }), reviewer.id);
    const scores: { key: string; score: number | null; stockReason: string | null; comment: string }[] = await fullScores();
    const decision = rand() < 0.5 ? 'accept' : 'rework';
    if (decision === 'rework') {
      const applicable = scores.filter((s) => s.score !== null);
      for (let k = 0; k < 1 + Math.floor(rand() * 3); k++) {
        const s = pick(applicable);
        s.score = Math.floor(rand() * (s.score as number));
        s.comment = 'Needs another station';
        const own = rubric.criteria.find((c) => c.key === s.key)?.stockReasons ?? [];
        s.stockReason = own.length && rand() < 0.6 ? pick(own) : null;
      }
    }
    const res = await agent.post(`/api/jobs/${job.id}/reviews`).send({ decision, scores });
    if (res.status !== 201) throw new Error(JSON.stringify(res.body));
  }

  // History at random past dates, weeks and rubric versions apart, some scores short.
  for (let i = 0; i < 40; i++) {
    const job = await createJob({ technicianId: pick(technicians).id });
    if (rand() < 0.2) await job.update({ siteVisitDate: null });
    const decidedAt = new Date(Date.now() - Math.floor(rand() * 400) * 86_400_000 - Math.floor(rand() * 86_400_000));
    const decision = pick(['accept', 'rework', 'recapture'] as const);
    const review = await createReview(job, pick([reviewer.id, otherReviewer.id]), decision, {
      revisionNumber: 1 + Math.floor(rand() * 3),
      score: rand() < 0.1 ? (null as unknown as number) : Math.round(rand() * 1000) / 10,
      decidedAt,
      claimedAt: rand() < 0.7 ? new Date(decidedAt.getTime() - Math.floor(rand() * 300) * 60_000) : null,
      dueAt: new Date(decidedAt.getTime() + (rand() - 0.5) * 86_400_000),
      kind: rand() < 0.1 ? 'blind_second' : 'primary',
    });
    for (const c of rubric.criteria) {
      if (rand() < 0.5) continue;
      await ReviewScore.create({
        reviewId: review.id,
        criterionKey: c.key,
        score: rand() < 0.1 ? null : Math.floor(rand() * 5),
        maxScore: 4,
        stockReason: rand() < 0.3 ? pick(c.stockReasons ?? ['Other']) : null,
        comment: 'x',
        carriedOver: false,
      });
    }
  }

  const technicianIds = technicians.map((t) => t.id).join(', ');
  const reviewerIds = [reviewer.id, otherReviewer.id].join(', ');
  for (const source of ROLLUP_SOURCES) {
    const byReviewer = source.key.includes('reviewer_id');
    const raw = await rowsOf(source.select(byReviewer ? `r.reviewer_id IN (${reviewerIds})` : `j.technician_id IN (${technicianIds})`));
    const rollup = await rowsOf(
      `SELECT * FROM ${source.table} WHERE ${byReviewer ? `reviewer_id IN (${reviewerIds})` : `technician_id IN (${technicianIds})`}`,
    );
    expect({ table: source.table, rows: rollup }).toEqual({ table: source.table, rows: raw });
    if (source.table === 'trend_technician_weeks') expect(raw.length).toBeGreaterThan(10);
  }
}, 30_000);
