import { type Request, type Response, Router } from 'express';
import { query } from 'express-validator';
import Papa from 'papaparse';

import type { TrendsQuery } from '../../shared/trends';
import { forbidden } from '../errors';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { calibration, reviewerTable, teamTable, technicianTrends } from '../services/trends-service';

export const trendsRouter = Router();

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const periodRules = [
  query('from', 'A date as YYYY-MM-DD').optional().matches(ISO_DATE).isISO8601({ strict: true }),
  query('to', 'A date as YYYY-MM-DD, not before from')
    .optional()
    .matches(ISO_DATE)
    .isISO8601({ strict: true })
    .custom((to: string, { req }) => typeof req.query?.from !== 'string' || to >= req.query.from),
  query('rubricVersion', 'A rubric version number').optional().isInt({ min: 1 }).toInt(),
  query('technicianId', 'Must be a user id').optional().isInt({ min: 1 }).toInt(),
  query('format', 'json or csv').optional().isIn(['json', 'csv']),
];

// Default period: the last twelve weeks up to today.
function filters(req: Request): TrendsQuery {
  const q = req.query as Record<string, string | undefined>;
  const today = new Date();
  const from = q.from ?? new Date(today.getTime() - 84 * 86_400_000).toISOString().slice(0, 10);
  return {
    from,
    to: q.to ?? today.toISOString().slice(0, 10),
    rubricVersion: q.rubricVersion ? Number(q.rubricVersion) : undefined,
    technicianId: q.technicianId ? Number(q.technicianId) : undefined,
  };
}

function send(req: Request, res: Response, name: string, body: unknown, rows: () => object[]) {
  if (req.query.format === 'csv') {
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="sightline-${name}.csv"`);
    // A cell starting with = + - @ is written as text, so a spreadsheet never runs it as a formula.
    res.send(Papa.unparse(rows(), { escapeFormulae: true }));
    return;
  }
  res.json(body);
}

const pct = (v: number | null | undefined) => (v === null || v === undefined ? '' : (v * 100).toFixed(1));

// Technicians read their own trends only; managers read anyone's and the team's.
trendsRouter.get('/', requireRole('technician', 'manager'), validate(...periodRules), async (req, res) => {
  const f = filters(req);
  if (req.user!.role === 'technician') {
    if (f.technicianId && f.technicianId !== req.user!.id) throw forbidden('Technicians see only their own trends.');
    f.technicianId = req.user!.id;
  }
  const trends = await technicianTrends(f);
  send(req, res, 'weekly', trends, () =>
    trends.weekly.map((w) => {
      const chart = trends.reworkChart.rows.find((r) => r.label === w.week);
      return {
        week_starting: w.week,
        reviews: w.reviews,
        mean_score: w.meanScore?.toFixed(1) ?? '',
        rework: w.rework,
        rework_rate_pct: pct(chart?.p),
        lower_limit_pct: pct(chart?.lcl),
        upper_limit_pct: pct(chart?.ucl),
        outside_limits: chart?.outside ?? '',
      };
    }),
  );
});

trendsRouter.get('/team', requireRole('manager'), validate(...periodRules), async (req, res) => {
  const rows = await teamTable(filters(req));
  send(req, res, 'team', { rows }, () =>
    rows.map((r) => ({
      technician: r.technician.name,
      reviews: r.reviews,
      mean_score: r.meanScore?.toFixed(1) ?? '',
      first_pass_yield_pct: pct(r.firstPassYield.interval?.estimate),
      fpy_low_pct: pct(r.firstPassYield.interval?.low),
      fpy_high_pct: pct(r.firstPassYield.interval?.high),
      first_reviews: r.firstPassYield.total,
      rework_rate_pct: pct(r.reworkRate),
      recaptures: r.recaptures,
      mean_revisions_to_acceptance: r.meanRevisionsToAcceptance?.toFixed(2) ?? '',
      median_hours_visit_to_acceptance: r.medianHoursVisitToAcceptance ?? '',
      timed_visits: r.visits.timed,
      planned_minutes_on_site: r.visits.plannedMinutes,
      actual_minutes_on_site: r.visits.actualMinutes,
      too_few_reviews: r.tooFew ? 'yes' : 'no',
    })),
  );
});

trendsRouter.get('/reviewers', requireRole('manager'), validate(...periodRules), async (req, res) => {
  const rows = await reviewerTable(filters(req));
  send(req, res, 'reviewers', { rows }, () =>
    rows.map((r) => ({
      reviewer: r.reviewer.name,
      reviews: r.reviews,
      median_minutes_claim_to_decision: r.medianMinutesClaimToDecision ?? '',
      decided_after_due_pct: pct(r.lateShare),
    })),
  );
});

trendsRouter.get('/calibration', requireRole('manager'), validate(...periodRules), async (req, res) => {
  const result = await calibration(filters(req));
  send(req, res, 'calibration', result, () =>
    result.reviewerPairs.map((p) => ({
      reviewer_a: p.reviewers[0],
      reviewer_b: p.reviewers[1],
      blind_pairs: p.n,
      decision_kappa: p.decisionKappa?.toFixed(3) ?? '',
      agreement: p.band ?? '',
    })),
  );
});
