// Quality trends, read from the weekly rollups (see the trend rollups migration): a period of
// a year is a few thousand summed rows, whatever the number of reviews and scores behind it.
// Node turns the sums into rates, intervals, control limits, exact medians and kappa.
import { QueryTypes } from 'sequelize';

import { DECISIONS } from '../../shared/review';
import { cohenKappa, landisKoch, medianOfCounts, pChart, wilsonInterval } from '../../shared/statistics';
import {
  type Calibration,
  MIN_REVIEWS_FOR_RATES,
  paretoBars,
  type ReviewerRow,
  type TeamRow,
  type TechnicianTrends,
  type TrendsQuery,
  weekSpan,
} from '../../shared/trends';
import { notFound } from '../errors';
import { sequelize, User } from '../models';
import { currentRubric } from './rubric-service';

type Filters = TrendsQuery;
type Params = Record<string, unknown>;

const select = <T extends object>(sql: string, replacements: Params) => sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));
const ratio = (sum: unknown, n: unknown) => (Number(n) ? Number(sum) / Number(n) : null);

// The rollup rows of the period, optionally for one technician and one rubric version.
function rollupWhere(f: Filters) {
  const span = weekSpan(f.from, f.to);
  const where = `t.week BETWEEN :fromWeek AND :toWeek
    ${f.technicianId ? 'AND t.technician_id = :technicianId' : ''}
    ${f.rubricVersion ? 'AND t.rubric_version = :rubricVersion' : ''}`;
  return { span, where, params: { ...f, fromWeek: span.fromWeek, toWeek: span.toWeek } as Params };
}

const TOTALS = `SUM(t.reviews) AS reviews, SUM(t.score_sum) AS score_sum, SUM(t.score_n) AS score_n,
  SUM(t.first_total) AS first_total, SUM(t.first_accepted) AS first_accepted, SUM(t.rework) AS rework,
  SUM(t.recaptures) AS recaptures, SUM(t.accepted) AS accepted, SUM(t.accepted_revision_sum) AS accepted_revision_sum`;
type Totals = {
  reviews: unknown;
  score_sum: unknown;
  score_n: unknown;
  first_total: unknown;
  first_accepted: unknown;
  rework: unknown;
  recaptures: unknown;
  accepted: unknown;
  accepted_revision_sum: unknown;
};

function medianByKey(rows: { k: number; value: number; n: number }[]) {
  const groups = new Map<number, { value: number; n: number }[]>();
  for (const r of rows) groups.set(Number(r.k), [...(groups.get(Number(r.k)) ?? []), { value: Number(r.value), n: Number(r.n) }]);
  return new Map([...groups].map(([k, counts]) => [k, medianOfCounts(counts)]));
}

export async function technicianTrends(f: Filters): Promise<TechnicianTrends> {
  let technician: { id: number; name: string } | null = null;
  if (f.technicianId) {
    const user = await User.findByPk(f.technicianId);
    if (!user || user.role !== 'technician') throw notFound('Technician');
    technician = { id: user.id, name: user.name };
  }
  const { span, where, params } = rollupWhere(f);

  // Independent reads of the rollups, side by side; the period's totals are the weeks' sums.
  const [weekly, hours, criteria, reasons, rubric] = await Promise.all([
    select<Totals & { week: string }>(
      `SELECT DATE_FORMAT(t.week, '%Y-%m-%d') AS week, ${TOTALS} FROM trend_technician_weeks t WHERE ${where} GROUP BY t.week ORDER BY t.week`,
      params,
    ),
    select<{ value: number; n: number }>(
      `SELECT t.hours AS value, SUM(t.n) AS n FROM trend_turnaround_weeks t WHERE ${where} GROUP BY t.hours`,
      params,
    ),
    select<{ criterion_key: string; n: unknown }>(
      `SELECT t.criterion_key, SUM(t.below_full) AS n FROM trend_criterion_weeks t WHERE ${where} GROUP BY t.criterion_key`,
      params,
    ),
    select<{ stock_reason: string; n: unknown }>(
      `SELECT t.stock_reason, SUM(t.n) AS n FROM trend_reason_weeks t WHERE ${where} GROUP BY t.stock_reason`,
      params,
    ),
    currentRubric(),
  ]);
  const sum = (key: keyof Totals) => weekly.reduce((total, w) => total + Number(w[key] ?? 0), 0);
  const totals = Object.fromEntries(
    (['reviews', 'first_total', 'first_accepted', 'recaptures', 'accepted', 'accepted_revision_sum'] as const).map((k) => [k, sum(k)]),
  ) as Record<'reviews' | 'first_total' | 'first_accepted' | 'recaptures' | 'accepted' | 'accepted_revision_sum', number>;
  const titles = new Map(rubric.criteria.map((c) => [c.key, c.title]));

  const reviews = Number(totals.reviews ?? 0);
  const firstTotal = Number(totals.first_total ?? 0);
  const firstAccepted = Number(totals.first_accepted ?? 0);
  return {
    period: { from: span.from, to: span.to },
    technician,
    reviews,
    tooFew: reviews < MIN_REVIEWS_FOR_RATES,
    weekly: weekly.map((w) => ({
      week: w.week,
      reviews: Number(w.reviews),
      meanScore: ratio(w.score_sum, w.score_n),
      rework: Number(w.rework),
    })),
    reworkChart: pChart(weekly.map((w) => ({ label: w.week, n: Number(w.reviews), defects: Number(w.rework) }))),
    firstPassYield: { accepted: firstAccepted, total: firstTotal, interval: wilsonInterval(firstAccepted, firstTotal) },
    meanRevisionsToAcceptance: ratio(totals.accepted_revision_sum, totals.accepted),
    recaptures: Number(totals.recaptures ?? 0),
    medianHoursVisitToAcceptance: medianOfCounts(hours.map((h) => ({ value: Number(h.value), n: Number(h.n) }))),
    paretoCriteria: paretoBars(criteria.map((c) => ({ label: titles.get(c.criterion_key) ?? c.criterion_key, count: Number(c.n) }))),
    paretoReasons: paretoBars(reasons.map((r) => ({ label: r.stock_reason, count: Number(r.n) }))),
  };
}

export async function teamTable(f: Filters): Promise<TeamRow[]> {
  const { where, params } = rollupWhere({ ...f, technicianId: undefined });
  const [technicians, sums, hours, visits] = await Promise.all([
    User.findAll({ where: { role: 'technician', active: true }, attributes: ['id', 'name'], order: [['name', 'ASC']] }),
    select<Totals & { technician_id: number }>(
      `SELECT t.technician_id, ${TOTALS} FROM trend_technician_weeks t WHERE ${where} GROUP BY t.technician_id`,
      params,
    ),
    select<{ k: number; value: number; n: number }>(
      `SELECT t.technician_id AS k, t.hours AS value, SUM(t.n) AS n FROM trend_turnaround_weeks t WHERE ${where}
       GROUP BY t.technician_id, t.hours`,
      params,
    ),
    // Planned against actual time on site, over the plans made in the period.
    select<{ technician_id: number; n: unknown; planned: unknown; actual: unknown }>(
      `SELECT j.technician_id, COUNT(*) AS n, SUM(v.planned_minutes) AS planned, SUM(v.actual_minutes) AS actual
       FROM visit_plans v JOIN jobs j ON j.id = v.job_id
       WHERE v.planned_minutes IS NOT NULL AND v.actual_minutes IS NOT NULL
         AND v.created_at >= :from AND v.created_at < DATE_ADD(:to, INTERVAL 1 DAY)
       GROUP BY j.technician_id`,
      { from: f.from, to: f.to },
    ),
  ]);
  const sumsOf = new Map(sums.map((s) => [Number(s.technician_id), s]));
  const visitsOf = new Map(visits.map((v) => [Number(v.technician_id), v]));
  const medianOf = medianByKey(hours);
  return technicians.map((u) => {
    const r = sumsOf.get(u.id);
    const reviews = Number(r?.reviews ?? 0);
    const firstTotal = Number(r?.first_total ?? 0);
    const firstAccepted = Number(r?.first_accepted ?? 0);
    return {
      technician: { id: u.id, name: u.name },
      reviews,
      meanScore: r ? ratio(r.score_sum, r.score_n) : null,
      firstPassYield: { accepted: firstAccepted, total: firstTotal, interval: wilsonInterval(firstAccepted, firstTotal) },
      reworkRate: reviews ? Number(r!.rework) / reviews : null,
      recaptures: Number(r?.recaptures ?? 0),
      meanRevisionsToAcceptance: r ? ratio(r.accepted_revision_sum, r.accepted) : null,
      medianHoursVisitToAcceptance: medianOf.get(u.id) ?? null,
      visits: {
        timed: Number(visitsOf.get(u.id)?.n ?? 0),
        plannedMinutes: Number(visitsOf.get(u.id)?.planned ?? 0),
        actualMinutes: Number(visitsOf.get(u.id)?.actual ?? 0),
      },
      tooFew: reviews < MIN_REVIEWS_FOR_RATES,
    };
  });
}

export async function reviewerTable(f: Filters): Promise<ReviewerRow[]> {
  const span = weekSpan(f.from, f.to);
  const params = { fromWeek: span.fromWeek, toWeek: span.toWeek };
  const reviewers = await User.findAll({ where: { role: 'reviewer', active: true }, attributes: ['id', 'name'], order: [['name', 'ASC']] });
  const sums = await select<{ reviewer_id: number; reviews: unknown; late: unknown }>(
    `SELECT t.reviewer_id, SUM(t.reviews) AS reviews, SUM(t.late) AS late FROM trend_reviewer_weeks t
     WHERE t.week BETWEEN :fromWeek AND :toWeek GROUP BY t.reviewer_id`,
    params,
  );
  const minutes = await select<{ k: number; value: number; n: number }>(
    `SELECT t.reviewer_id AS k, t.minutes AS value, SUM(t.n) AS n FROM trend_reviewer_minutes t
     WHERE t.week BETWEEN :fromWeek AND :toWeek GROUP BY t.reviewer_id, t.minutes`,
    params,
  );
  const sumsOf = new Map(sums.map((s) => [Number(s.reviewer_id), s]));
  const medianOf = medianByKey(minutes);
  return reviewers.map((u) => {
    const reviews = Number(sumsOf.get(u.id)?.reviews ?? 0);
    return {
      reviewer: { id: u.id, name: u.name },
      reviews,
      medianMinutesClaimToDecision: medianOf.get(u.id) ?? null,
      lateShare: reviews ? Number(sumsOf.get(u.id)!.late) / reviews : null,
    };
  });
}

const SCORE_LEVELS = [0, 1, 2, 3, 4];

export async function calibration(f: Filters): Promise<Calibration> {
  const period = `s.decided_at >= :from AND s.decided_at < DATE_ADD(:to, INTERVAL 1 DAY)`;
  const pairsFrom = `FROM second_reviews sr JOIN reviews f ON f.id = sr.first_review_id JOIN reviews s ON s.id = sr.second_review_id`;
  const decisions = await select<{ a: string; b: string; n: number }>(
    `SELECT f.decision AS a, s.decision AS b, COUNT(*) AS n ${pairsFrom} WHERE ${period} GROUP BY f.decision, s.decision`,
    f,
  );
  const scores = await select<{ a: number; b: number; n: number }>(
    `SELECT fs.score AS a, ss.score AS b, COUNT(*) AS n ${pairsFrom}
     JOIN review_scores fs ON fs.review_id = f.id
     JOIN review_scores ss ON ss.review_id = s.id AND ss.criterion_key = fs.criterion_key
     WHERE ${period} AND fs.max_score = 4 AND fs.score IS NOT NULL AND ss.score IS NOT NULL
     GROUP BY fs.score, ss.score`,
    f,
  );
  const [summary] = (await select<{ pairs: number; mad: string | null }>(
    `SELECT COUNT(*) AS pairs, AVG(ABS(f.score - s.score)) AS mad ${pairsFrom} WHERE ${period}`,
    f,
  )) as [{ pairs: number; mad: string | null }];
  const perPair = await select<{ r1: string; r2: string; a: string; b: string; n: number }>(
    `SELECT LEAST(fu.name, su.name) AS r1, GREATEST(fu.name, su.name) AS r2, f.decision AS a, s.decision AS b, COUNT(*) AS n ${pairsFrom}
     JOIN users fu ON fu.id = f.reviewer_id JOIN users su ON su.id = s.reviewer_id
     WHERE ${period} GROUP BY r1, r2, f.decision, s.decision`,
    f,
  );

  const decisionTable = (rows: { a: string; b: string; n: number }[]) =>
    DECISIONS.map((a) => DECISIONS.map((b) => Number(rows.find((r) => r.a === a && r.b === b)?.n ?? 0)));
  const stat = (table: number[][], weights: null | 'linear') => {
    const n = table.flat().reduce((s, v) => s + v, 0);
    const k = cohenKappa(table, weights);
    return { n, kappa: k?.kappa ?? null, band: k ? landisKoch(k.kappa) : null, table };
  };
  const pairNames = [...new Set(perPair.map((p) => `${p.r1}\u0000${p.r2}`))];
  return {
    pairs: Number(summary.pairs),
    decisions: stat(decisionTable(decisions), null),
    criterionScores: stat(
      SCORE_LEVELS.map((a) => SCORE_LEVELS.map((b) => Number(scores.find((r) => Number(r.a) === a && Number(r.b) === b)?.n ?? 0))),
      'linear',
    ),
    meanAbsoluteScoreDifference: num(summary.mad),
    reviewerPairs: pairNames.map((key) => {
      const [r1, r2] = key.split('\u0000');
      const table = decisionTable(perPair.filter((p) => p.r1 === r1 && p.r2 === r2));
      const s = stat(table, null);
      return { reviewers: [r1, r2] as [string, string], n: s.n, decisionKappa: s.kappa, band: s.band };
    }),
  };
}
