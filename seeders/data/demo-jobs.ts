// Invented demo jobs for Orrinvale Site Imaging in the fictional city of Maraskell,
// with 12 weeks of reviews. Deterministic (seeded random numbers), so every machine gets the
// same demo. Each technician has a pattern for the trends screens to show: steady, improving,
// drifting down, a recurring reflective-surface failure, occasional recaptures, uneven.
import { type CaptureRecord, type LevelKind, type Room } from '../../shared/capture-record';
import { DEFAULT_RUBRIC } from '../../shared/default-rubric';
import type { JobFields, JobStatus, LossType, PropertyType } from '../../shared/jobs';
import type { Decision } from '../../shared/review';
import { criterionApplies, scaleMax } from '../../shared/rubric';
import { evaluate, isBelowFullMarks } from '../../shared/scoring';
import { expectedStations, MAX_STATION_SPACING_M } from '../../shared/station-spacing';
import { feetToMetres } from '../../shared/units';

export function seededRandom(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const STREETS = [
  'Orvell Lane',
  'Tessaly Row',
  'Brindmoor Road',
  'Callowin Terrace',
  'Smerrit Close',
  'Undlecote Mews',
  'Vantrie Drive',
  'Pennowick Street',
  'Yarrowlet Avenue',
  'Keddlemoor Court',
  'Marnish Hill',
  'Oxbrindle Way',
];
const PROPERTY_TYPES: PropertyType[] = ['single_family', 'single_family', 'townhouse', 'condo_unit', 'manufactured_home'];
const LOSS_TYPES: LossType[] = ['water', 'water', 'water', 'fire', 'smoke', 'wind', 'hail', 'other'];

type RoomTemplate = { name: string; level: LevelKind; lengthFt: number; widthFt: number };
const ROOMS: RoomTemplate[] = [
  { name: 'Kitchen', level: 'ground', lengthFt: 14, widthFt: 12 },
  { name: 'Living room', level: 'ground', lengthFt: 18, widthFt: 15 },
  { name: 'Dining room', level: 'ground', lengthFt: 12, widthFt: 11 },
  { name: 'Hallway', level: 'ground', lengthFt: 16, widthFt: 4 },
  { name: 'Main bedroom', level: 'upper', lengthFt: 15, widthFt: 13 },
  { name: 'Bathroom', level: 'upper', lengthFt: 9, widthFt: 7 },
  { name: 'Second bedroom', level: 'upper', lengthFt: 12, widthFt: 10 },
  { name: 'Laundry', level: 'basement', lengthFt: 10, widthFt: 8 },
  { name: 'Attic', level: 'attic', lengthFt: 24, widthFt: 14 },
];

export const JOB_COUNT = 120;
const DAY = 86_400_000;
const HOUR = 3_600_000;
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

// The most recent jobs show every state of the loop; older ones are finished.
const RECENT_STATES: JobStatus[] = [
  'draft',
  'submitted',
  'in_review',
  'rework_requested',
  'resubmitted',
  'draft',
  'submitted',
  'accepted',
  'in_review',
  'draft',
  'rework_requested',
  'submitted',
  'resubmitted',
  'draft',
  'in_review',
];

export type DemoScore = { key: string; score: number | null; maxScore: number; comment: string | null; stockReason: string | null };
export type DemoReview = {
  revision: number;
  reviewerIndex: number;
  kind: 'primary' | 'blind_second';
  claimedAt: Date | null;
  decidedAt: Date;
  score: number | null;
  passed: boolean;
  decision: Decision;
  scores: DemoScore[];
};
export type DemoJob = Omit<JobFields, 'dueAt'> & {
  dueAt: Date;
  status: JobStatus;
  technicianIndex: number;
  revisions: { record: CaptureRecord; submittedAt: Date }[];
  reviews: DemoReview[];
  pausedAt: Date | null;
  pausedMs: number;
  draft: CaptureRecord;
};

// Each technician's quality (0–1) at time t (0 = twelve weeks ago, 1 = now).
const QUALITY: ((t: number) => number)[] = [() => 0.93, (t) => 0.62 + 0.36 * t, (t) => 0.96 - 0.24 * t, () => 0.92, () => 0.9, () => 0.84];
const REFLECTIVE_TROUBLE = 3; // Mateo keeps leaving mirrors unflagged.
const RECAPTURE_PRONE = 4;

export function demoRecord(rand: () => number, technicianIndex: number, variant: number): CaptureRecord {
  const cameraClass = rand() < 0.7 ? 'tripod_depth' : 'camera_360';
  const spacing = MAX_STATION_SPACING_M[cameraClass]!;
  const count = 4 + Math.floor(rand() * 5);
  const rooms: Room[] = ROOMS.slice(0, count).map((t, i) => {
    const lengthM = feetToMetres(t.lengthFt);
    const widthM = feetToMetres(t.widthFt);
    const expected = expectedStations(lengthM * widthM, spacing);
    const stations = Math.max(1, expected - (variant === 0 && rand() < 0.2 ? 1 : 0));
    const hasMirror =
      t.name === 'Bathroom' || t.name === 'Main bedroom' || (technicianIndex === REFLECTIVE_TROUBLE && t.name === 'Living room');
    const unflagged = variant === 0 && (technicianIndex === REFLECTIVE_TROUBLE ? rand() < 0.7 : rand() < 0.1);
    return {
      key: `r${i + 1}`,
      name: t.name,
      level: t.level,
      lengthM,
      widthM,
      areaM2: null,
      stations,
      doorwayStation: variant > 0 || rand() > 0.12,
      reflective: hasMirror ? [{ kind: 'mirror', found: 1, flagged: unflagged ? 0 : 1 }] : [],
    };
  });
  const exteriorStations = 4 + Math.floor(rand() * 6);
  const levels = [...new Set(rooms.map((r) => r.level))].map((level) => ({
    level,
    stations: rooms.filter((r) => r.level === level).reduce((s, r) => s + r.stations, 0),
  }));
  levels.push({ level: 'exterior', stations: exteriorStations });
  const withGap = rand() < 0.25;
  return {
    cameraClass,
    units: 'ft',
    levels,
    rooms,
    exteriorStations,
    totalStations: rooms.reduce((s, r) => s + r.stations, 0) + exteriorStations,
    glazingFlagged: rand() < 0.8 ? 'yes' : 'partly',
    models: [
      {
        key: 'm1',
        structure: 'main_dwelling',
        structureNote: '',
        splitReason: null,
        splitNote: '',
        platformReference: `TRC-${Math.floor(rand() * 90000) + 10000}`,
      },
    ],
    detachedStructures: [],
    gaps: withGap
      ? [
          {
            key: 'g1',
            location: 'Sunroom, west windows',
            cause: 'direct_sun',
            resolved: variant > 0,
            note: variant > 0 ? 'Recaptured at dusk' : '',
          },
        ]
      : [],
    damageAreas: [
      {
        key: 'd1',
        roomKey: 'r1',
        description: 'Ceiling stain about 3 ft across',
        lossType: 'water',
        stationNumbers: [2, 3],
        photoFileIds: [],
      },
    ],
    panoramas: { count: rand() < 0.5 ? 2 : 0, roomKeys: ['r1'] },
    processing: { confirmed: true, confirmedAt: null },
    safety: { hazards: rand() < 0.2 ? ['standing_water'] : [], note: '' },
    notes: variant > 0 ? 'Corrected as asked in the rework request.' : '',
  };
}

export function scoreRecord(rand: () => number, record: CaptureRecord, quality: number, technicianIndex: number): DemoScore[] {
  return DEFAULT_RUBRIC.criteria.map((c) => {
    const max = scaleMax(c.scale);
    if (!criterionApplies(c, record)) return { key: c.key, score: null, maxScore: max, comment: null, stockReason: null };
    let q = quality + (rand() - 0.5) * 0.24;
    if (c.key === 'reflective') {
      const unflagged = record.rooms.some((r) => r.reflective.some((s) => s.found > s.flagged));
      q = unflagged ? (technicianIndex === REFLECTIVE_TROUBLE ? 0.35 : 0.55) : Math.max(q, 0.9);
    }
    if (c.key === 'processing') q = 1;
    const score = max === 1 ? (rand() < q + 0.05 ? 1 : 0) : Math.min(4, Math.max(0, Math.round(4 * q)));
    const below = isBelowFullMarks(c, score);
    return {
      key: c.key,
      score,
      maxScore: max,
      comment: below ? `${c.title}: falls short (demo)` : null,
      stockReason: below ? (c.stockReasons[Math.floor(rand() * c.stockReasons.length)] ?? null) : null,
    };
  });
}

export function review(
  rand: () => number,
  revision: number,
  reviewerIndex: number,
  submittedAt: Date,
  scores: DemoScore[],
  forced?: Decision,
): DemoReview {
  const evaluation = evaluate(DEFAULT_RUBRIC, Object.fromEntries(scores.map((s) => [s.key, s.score])));
  const claimedAt = new Date(submittedAt.getTime() + (2 + rand() * 40) * HOUR);
  const decidedAt = new Date(claimedAt.getTime() + (15 + rand() * 100) * 60_000);
  const decision = forced ?? (evaluation.passed ? 'accept' : 'rework');
  return {
    revision,
    reviewerIndex,
    kind: 'primary',
    claimedAt,
    decidedAt,
    score: evaluation.score,
    passed: evaluation.passed,
    decision,
    scores,
  };
}

// A blind second review: the same revision scored again, mostly agreeing within one level.
function blindSecond(rand: () => number, first: DemoReview): DemoReview {
  const scores = first.scores.map((s) => {
    if (s.score === null || rand() > 0.3) return { ...s };
    const moved = Math.min(s.maxScore, Math.max(0, s.score + (rand() < 0.5 ? -1 : 1)));
    return { ...s, score: moved, comment: moved < s.maxScore ? 'Second look: falls short (demo)' : null };
  });
  const evaluation = evaluate(DEFAULT_RUBRIC, Object.fromEntries(scores.map((s) => [s.key, s.score])));
  const decidedAt = new Date(first.decidedAt.getTime() + (6 + rand() * 48) * HOUR);
  return {
    revision: first.revision,
    reviewerIndex: (first.reviewerIndex + 1) % 3,
    kind: 'blind_second',
    claimedAt: null,
    decidedAt,
    score: evaluation.score,
    passed: evaluation.passed,
    decision: evaluation.passed ? 'accept' : 'rework',
    scores,
  };
}

export function demoJobs(now = new Date()): DemoJob[] {
  const rand = seededRandom(20261201);
  const jobs: DemoJob[] = [];
  for (let i = 0; i < JOB_COUNT; i++) {
    const technicianIndex = i % 6;
    const weeksAgo = Math.floor((JOB_COUNT - 1 - i) / 10);
    const t = (11 - Math.min(weeksAgo, 11)) / 11;
    const recent = i - (JOB_COUNT - RECENT_STATES.length);
    const siteVisit =
      recent >= 0
        ? new Date(now.getTime() - (recent % 6) * DAY - 12 * HOUR)
        : new Date(now.getTime() - weeksAgo * 7 * DAY - Math.floor(rand() * 5) * DAY - 12 * HOUR);
    const loss = new Date(siteVisit.getTime() - (1 + Math.floor(rand() * 4)) * DAY);
    const dueAt = new Date(siteVisit.getTime() + 4 * DAY);
    const quality = QUALITY[technicianIndex](t);
    const recordRand = seededRandom(1000 + i);
    const first = demoRecord(recordRand, technicianIndex, 0);
    const second = demoRecord(seededRandom(1000 + i), technicianIndex, 1);
    const firstSubmitted = new Date(siteVisit.getTime() + (4 + rand() * 20) * HOUR);
    const reviewer = i % 3;

    const revisions: DemoJob['revisions'] = [];
    const reviews: DemoReview[] = [];
    let status: JobStatus;
    let pausedAt: Date | null = null;
    let pausedMs = 0;

    const state = recent >= 0 ? RECENT_STATES[recent] : null;
    if (state === 'draft') {
      status = 'draft';
    } else if (state === 'submitted' || state === 'in_review') {
      revisions.push({ record: first, submittedAt: firstSubmitted });
      status = state;
    } else {
      revisions.push({ record: first, submittedAt: firstSubmitted });
      let r1 = review(rand, 1, reviewer, firstSubmitted, scoreRecord(rand, first, quality, technicianIndex));
      if (state === 'rework_requested' || state === 'resubmitted') {
        if (r1.decision === 'accept')
          r1 = review(rand, 1, reviewer, firstSubmitted, scoreRecord(rand, first, 0.6, technicianIndex), 'rework');
        else r1.decision = 'rework';
      } else if (state === 'accepted' && !r1.passed) {
        r1 = review(rand, 1, reviewer, firstSubmitted, scoreRecord(rand, first, 1, technicianIndex), 'accept');
      } else if (!r1.passed && rand() < (technicianIndex === RECAPTURE_PRONE ? 0.4 : 0.1)) {
        r1.decision = 'recapture';
      }
      reviews.push(r1);
      if (r1.decision === 'accept') status = 'accepted';
      else if (r1.decision === 'recapture') status = 'recapture_required';
      else if (state === 'rework_requested') {
        status = 'rework_requested';
        pausedAt = r1.decidedAt;
      } else {
        const resubmittedAt = new Date(r1.decidedAt.getTime() + (6 + rand() * 30) * HOUR);
        pausedMs = resubmittedAt.getTime() - r1.decidedAt.getTime();
        revisions.push({ record: second, submittedAt: resubmittedAt });
        if (state === 'resubmitted') status = 'resubmitted';
        else {
          const r2 = review(
            rand,
            2,
            (reviewer + 1) % 3,
            resubmittedAt,
            scoreRecord(rand, second, Math.min(1, quality + 0.2), technicianIndex),
          );
          if (r2.decision !== 'accept') r2.decision = 'recapture';
          reviews.push(r2);
          status = r2.decision === 'accept' ? 'accepted' : 'recapture_required';
        }
      }
      const accepted = reviews.find((r) => r.decision === 'accept');
      if (accepted && rand() < 0.12) reviews.push(blindSecond(rand, accepted));
    }

    const priorityRoll = rand();
    const latest = revisions.at(-1)?.record;
    jobs.push(
      keepInPast(now, {
        claimReference: `MRK-26-${String(1001 + i)}`,
        street: `${10 + Math.floor(rand() * 190)} ${STREETS[i % STREETS.length]}`,
        city: 'Maraskell',
        postcode: `MK-${1000 + Math.floor(rand() * 9000)}`,
        propertyType: PROPERTY_TYPES[Math.floor(rand() * PROPERTY_TYPES.length)],
        lossType: LOSS_TYPES[Math.floor(rand() * LOSS_TYPES.length)],
        lossDate: isoDate(loss),
        siteVisitDate: status === 'draft' && rand() < 0.4 ? null : isoDate(siteVisit),
        dueAt,
        priority: priorityRoll < 0.75 ? 'normal' : priorityRoll < 0.93 ? 'urgent' : 'catastrophe',
        status,
        technicianIndex,
        revisions,
        reviews,
        pausedAt,
        pausedMs,
        draft: latest ?? { ...first, processing: { confirmed: false, confirmedAt: null } },
      }),
    );
  }
  return jobs;
}

// Nothing in the demo happens in the future ("submitted 1 minute ago" at midnight): a job
// whose latest event would fall after `now` moves back, whole days at a time so its dates
// stay whole, until that event is at least a few minutes old. Only the due date may lie ahead.
const PAST_MARGIN_MS = 10 * 60_000;

export function latestDemoEvent(job: DemoJob): number {
  return Math.max(
    new Date(`${job.lossDate}T00:00:00Z`).getTime(),
    job.siteVisitDate ? new Date(`${job.siteVisitDate}T00:00:00Z`).getTime() : 0,
    ...job.revisions.map((r) => r.submittedAt.getTime()),
    ...job.reviews.flatMap((r) => [r.decidedAt.getTime(), r.claimedAt?.getTime() ?? 0]),
    job.pausedAt?.getTime() ?? 0,
  );
}

export function keepInPast(now: Date, job: DemoJob): DemoJob {
  const over = latestDemoEvent(job) - (now.getTime() - PAST_MARGIN_MS);
  if (over <= 0) return job;
  const shift = Math.ceil(over / DAY) * DAY;
  const back = (d: Date) => new Date(d.getTime() - shift);
  const backDate = (s: string) => isoDate(back(new Date(`${s}T00:00:00Z`)));
  return {
    ...job,
    lossDate: backDate(job.lossDate),
    siteVisitDate: job.siteVisitDate ? backDate(job.siteVisitDate) : null,
    dueAt: back(job.dueAt),
    revisions: job.revisions.map((r) => ({ ...r, submittedAt: back(r.submittedAt) })),
    reviews: job.reviews.map((r) => ({ ...r, decidedAt: back(r.decidedAt), claimedAt: r.claimedAt ? back(r.claimedAt) : null })),
    pausedAt: job.pausedAt ? back(job.pausedAt) : null,
  };
}
