// Shapes of the trends API, shared by server and screens.
import type { Interval, PChartRow } from './statistics';

export const MIN_REVIEWS_FOR_RATES = 5;

export type TrendsQuery = { from: string; to: string; rubricVersion?: number; technicianId?: number };

export type WeeklyPoint = { week: string; reviews: number; meanScore: number | null; rework: number };

export type ParetoBar = { label: string; count: number; cumulativeShare: number };

export type TechnicianTrends = {
  period: { from: string; to: string };
  technician: { id: number; name: string } | null;
  reviews: number;
  tooFew: boolean;
  weekly: WeeklyPoint[];
  reworkChart: { centre: number | null; rows: PChartRow[] };
  firstPassYield: { accepted: number; total: number; interval: Interval | null };
  meanRevisionsToAcceptance: number | null;
  recaptures: number;
  medianHoursVisitToAcceptance: number | null;
  paretoCriteria: ParetoBar[];
  paretoReasons: ParetoBar[];
};

export type TeamRow = {
  technician: { id: number; name: string };
  reviews: number;
  meanScore: number | null;
  firstPassYield: { accepted: number; total: number; interval: Interval | null };
  reworkRate: number | null;
  recaptures: number;
  meanRevisionsToAcceptance: number | null;
  medianHoursVisitToAcceptance: number | null;
  // Visits with both a planned and a recorded time on site (from the visit plans).
  visits: { timed: number; plannedMinutes: number; actualMinutes: number };
  tooFew: boolean;
};

export type ReviewerRow = {
  reviewer: { id: number; name: string };
  reviews: number;
  medianMinutesClaimToDecision: number | null;
  lateShare: number | null;
};

export type AgreementStat = { n: number; kappa: number | null; band: string | null; table: number[][] };

export type Calibration = {
  pairs: number;
  decisions: AgreementStat;
  criterionScores: AgreementStat;
  meanAbsoluteScoreDifference: number | null;
  reviewerPairs: { reviewers: [string, string]; n: number; decisionKappa: number | null; band: string | null }[];
};

// Pareto bars: counts sorted high to low with the running share of the total.
export function paretoBars(rows: { label: string; count: number }[]): ParetoBar[] {
  const sorted = [...rows].sort((a, b) => b.count - a.count || a.label.localeCompare(b.label));
  const total = sorted.reduce((s, r) => s + r.count, 0);
  let running = 0;
  return sorted.map((r) => {
    running += r.count;
    return { ...r, cumulativeShare: total ? running / total : 0 };
  });
}

const DAY_MS = 86_400_000;
const isoDay = (t: number) => new Date(t).toISOString().slice(0, 10);

// Trends are kept per week (Monday to Sunday, UTC): a period widens to the whole weeks it
// touches, and the answer states the span it covers.
export function weekSpan(from: string, to: string): { fromWeek: string; toWeek: string; from: string; to: string } {
  const monday = (day: string) => {
    const t = Date.parse(`${day}T00:00:00Z`);
    return t - ((new Date(t).getUTCDay() + 6) % 7) * DAY_MS;
  };
  const first = monday(from);
  const last = monday(to);
  return { fromWeek: isoDay(first), toWeek: isoDay(last), from: isoDay(first), to: isoDay(last + 6 * DAY_MS) };
}
