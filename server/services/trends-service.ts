// Quality trends. Counting and averaging happen in MariaDB (GROUP BY over indexed columns);
// Node only turns the aggregates into intervals, control limits and kappa.
import { QueryTypes } from 'sequelize';

import { DECISIONS } from '../../shared/review';
import { cohenKappa, landisKoch, pChart, wilsonInterval } from '../../shared/statistics';
import {
  type Calibration,
  MIN_REVIEWS_FOR_RATES,
  paretoBars,
  type ReviewerRow,
  type TeamRow,
  type TechnicianTrends,
  type TrendsQuery,
} from '../../shared/trends';
import { notFound } from '../errors';
import { sequelize, User } from '../models';
import { currentRubric } from './rubric-service';

type Filters = TrendsQuery;

const select = <T extends object>(sql: string, replacements: Filters) =>
  sequelize.query<T>(sql, { replacements: replacements as Record<string, unknown>, type: QueryTypes.SELECT });
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

// Shared WHERE for primary reviews in the period (and optionally one technician, one rubric version).
function primaryWhere(f: Filters) {
  return `r.kind = 'primary' AND r.decided_at >= :from AND r.decided_at < DATE_ADD(:to, INTERVAL 1 DAY)
    ${f.technicianId ? 'AND j.technician_id = :technicianId' : ''}
    ${f.rubricVersion ? 'AND ru.version = :rubricVersion' : ''}`;
}
const FROM_PRIMARY = 'FROM reviews r JOIN jobs j ON j.id = r.job_id JOIN rubrics ru ON ru.id = r.rubric_id';

export async function technicianTrends(f: Filters): Promise<TechnicianTrends> {
  let technician: { id: number; name: string } | null = null;
  if (f.technicianId) {
    const user = await User.findByPk(f.technicianId);
    if (!user || user.role !== 'technician') throw notFound('Technician');
    technician = { id: user.id, name: user.name };
  }
  const where = primaryWhere(f);
  const params = { ...f };

  const weekly = await select<{ week: string; reviews: number; mean_score: string | null; rework: number }>(
    `SELECT DATE_FORMAT(DATE_SUB(DATE(r.decided_at), INTERVAL WEEKDAY(r.decided_at) DAY), '%Y-%m-%d') AS week,
            COUNT(*) AS reviews, AVG(r.score) AS mean_score, SUM(r.decision = 'rework') AS rework
     ${FROM_PRIMARY} WHERE ${where} GROUP BY week ORDER BY week`,
    params,
  );

  const [totals] = (await select<{
    reviews: number;
    first_total: number;
    first_accepted: number;
    recaptures: number;
    mean_revisions: string | null;
  }>(
    `SELECT COUNT(*) AS reviews,
            SUM(r.revision_number = 1) AS first_total,
            SUM(r.revision_number = 1 AND r.decision = 'accept') AS first_accepted,
            SUM(r.decision = 'recapture') AS recaptures,
            AVG(CASE WHEN r.decision = 'accept' THEN r.revision_number END) AS mean_revisions
     ${FROM_PRIMARY} WHERE ${where}`,
    params,
  )) as [{ reviews: number; first_total: number; first_accepted: number; recaptures: number; mean_revisions: string | null }];

  const medianRows = await select<{ median_hours: string | null }>(
    `SELECT MEDIAN(TIMESTAMPDIFF(HOUR, j.site_visit_date, r.decided_at)) OVER () AS median_hours
     ${FROM_PRIMARY} WHERE ${where} AND r.decision = 'accept' AND j.site_visit_date IS NOT NULL LIMIT 1`,
    params,
  );

  const criteria = await select<{ criterion_key: string; n: number }>(
    `SELECT rs.criterion_key, COUNT(*) AS n ${FROM_PRIMARY} JOIN review_scores rs ON rs.review_id = r.id
     WHERE ${where} AND rs.score < rs.max_score GROUP BY rs.criterion_key`,
    params,
  );
  const reasons = await select<{ stock_reason: string; n: number }>(
    `SELECT rs.stock_reason, COUNT(*) AS n ${FROM_PRIMARY} JOIN review_scores rs ON rs.review_id = r.id
     WHERE ${where} AND rs.stock_reason IS NOT NULL GROUP BY rs.stock_reason`,
    params,
  );
  const titles = new Map((await currentRubric()).criteria.map((c) => [c.key, c.title]));

  const reviews = Number(totals.reviews);
  const firstTotal = Number(totals.first_total ?? 0);
  const firstAccepted = Number(totals.first_accepted ?? 0);
  return {
    period: { from: f.from, to: f.to },
    technician,
    reviews,
    tooFew: reviews < MIN_REVIEWS_FOR_RATES,
    weekly: weekly.map((w) => ({ week: w.week, reviews: Number(w.reviews), meanScore: num(w.mean_score), rework: Number(w.rework) })),
    reworkChart: pChart(weekly.map((w) => ({ label: w.week, n: Number(w.reviews), defects: Number(w.rework) }))),
    firstPassYield: { accepted: firstAccepted, total: firstTotal, interval: wilsonInterval(firstAccepted, firstTotal) },
    meanRevisionsToAcceptance: num(totals.mean_revisions),
    recaptures: Number(totals.recaptures ?? 0),
    medianHoursVisitToAcceptance: num(medianRows[0]?.median_hours),
    paretoCriteria: paretoBars(criteria.map((c) => ({ label: titles.get(c.criterion_key) ?? c.criterion_key, count: Number(c.n) }))),
    paretoReasons: paretoBars(reasons.map((r) => ({ label: r.stock_reason, count: Number(r.n) }))),
  };
}

export async function teamTable(f: Filters): Promise<TeamRow[]> {
  const where = primaryWhere({ ...f, technicianId: undefined });
  const rows = await select<{
    id: number;
    name: string;
    reviews: number;
    mean_score: string | null;
    first_total: number;
    first_accepted: number;
    rework: number;
    recaptures: number;
    mean_revisions: string | null;
  }>(
    `SELECT u.id, u.name, COUNT(x.id) AS reviews, AVG(x.score) AS mean_score,
            SUM(x.revision_number = 1) AS first_total, SUM(x.revision_number = 1 AND x.decision = 'accept') AS first_accepted,
            SUM(x.decision = 'rework') AS rework, SUM(x.decision = 'recapture') AS recaptures,
            AVG(CASE WHEN x.decision = 'accept' THEN x.revision_number END) AS mean_revisions
     FROM users u
     LEFT JOIN (SELECT r.id, r.score, r.revision_number, r.decision, j.technician_id ${FROM_PRIMARY} WHERE ${where}) x ON x.technician_id = u.id
     WHERE u.role = 'technician' AND u.active = 1
     GROUP BY u.id, u.name ORDER BY u.name`,
    f,
  );
  const medians = await select<{ technician_id: number; median_hours: string }>(
    `SELECT DISTINCT j.technician_id, MEDIAN(TIMESTAMPDIFF(HOUR, j.site_visit_date, r.decided_at)) OVER (PARTITION BY j.technician_id) AS median_hours
     ${FROM_PRIMARY} WHERE ${where} AND r.decision = 'accept' AND j.site_visit_date IS NOT NULL`,
    f,
  );
  const medianOf = new Map(medians.map((m) => [Number(m.technician_id), Number(m.median_hours)]));
  return rows.map((r) => {
    const reviews = Number(r.reviews);
    const firstTotal = Number(r.first_total ?? 0);
    const firstAccepted = Number(r.first_accepted ?? 0);
    return {
      technician: { id: r.id, name: r.name },
      reviews,
      meanScore: num(r.mean_score),
      firstPassYield: { accepted: firstAccepted, total: firstTotal, interval: wilsonInterval(firstAccepted, firstTotal) },
      reworkRate: reviews ? Number(r.rework) / reviews : null,
      recaptures: Number(r.recaptures ?? 0),
      meanRevisionsToAcceptance: num(r.mean_revisions),
      medianHoursVisitToAcceptance: medianOf.get(r.id) ?? null,
      tooFew: reviews < MIN_REVIEWS_FOR_RATES,
    };
  });
}

export async function reviewerTable(f: Filters): Promise<ReviewerRow[]> {
  const rows = await select<{ id: number; name: string; reviews: number; late: number }>(
    `SELECT u.id, u.name, COUNT(r.id) AS reviews, SUM(r.decided_at > r.due_at) AS late
     FROM users u LEFT JOIN reviews r ON r.reviewer_id = u.id AND r.kind = 'primary'
       AND r.decided_at >= :from AND r.decided_at < DATE_ADD(:to, INTERVAL 1 DAY)
     WHERE u.role = 'reviewer' AND u.active = 1 GROUP BY u.id, u.name ORDER BY u.name`,
    f,
  );
  const medians = await select<{ reviewer_id: number; median_minutes: string }>(
    `SELECT DISTINCT r.reviewer_id, MEDIAN(TIMESTAMPDIFF(MINUTE, r.claimed_at, r.decided_at)) OVER (PARTITION BY r.reviewer_id) AS median_minutes
     FROM reviews r WHERE r.kind = 'primary' AND r.claimed_at IS NOT NULL
       AND r.decided_at >= :from AND r.decided_at < DATE_ADD(:to, INTERVAL 1 DAY)`,
    f,
  );
  const medianOf = new Map(medians.map((m) => [Number(m.reviewer_id), Number(m.median_minutes)]));
  return rows.map((r) => ({
    reviewer: { id: r.id, name: r.name },
    reviews: Number(r.reviews),
    medianMinutesClaimToDecision: medianOf.get(r.id) ?? null,
    lateShare: Number(r.reviews) ? Number(r.late) / Number(r.reviews) : null,
  }));
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
