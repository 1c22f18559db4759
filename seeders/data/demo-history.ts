// Two years of older, finished demo jobs (invented, like the rest of the demo), so the
// rework-risk model has history to learn from. A record's chance of coming back rises with what
// reviewers send back for — unflagged mirrors, rooms without a doorway station, unresolved gaps —
// with noise; who captured it plays no part.
import { type CaptureRecord, type Room } from '../../shared/capture-record';
import { LOSS_TYPES, PROPERTY_TYPES } from '../../shared/jobs';
import { type DemoJob, demoRecord, type DemoReview, review, scoreRecord, seededRandom, STREETS } from './demo-jobs';

export const HISTORY_COUNT = 420;
const DAY = 86_400_000;
const HOUR = 3_600_000;
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

// Some history records leave mirrors unflagged or doorways without a station, and some fix it.
function vary(record: CaptureRecord, rand: () => number): CaptureRecord {
  const rooms: Room[] = record.rooms.map((room) => ({
    ...room,
    doorwayStation: rand() > 0.18,
    reflective: room.reflective.map((s) => ({ ...s, flagged: rand() < 0.25 ? 0 : s.found })),
  }));
  return { ...record, rooms, gaps: record.gaps.map((g) => ({ ...g, resolved: rand() > 0.4 })) };
}

function quality(record: CaptureRecord, rand: () => number) {
  const unflagged = record.rooms.reduce((s, r) => s + r.reflective.reduce((t, x) => t + x.found - x.flagged, 0), 0);
  const noDoorway = record.rooms.filter((r) => !r.doorwayStation).length;
  const gaps = record.gaps.filter((g) => !g.resolved).length;
  return Math.max(0.2, 0.97 - 0.12 * unflagged - 0.07 * noDoorway - 0.1 * gaps + (rand() - 0.5) * 0.2);
}

export function demoHistory(now = new Date()): DemoJob[] {
  const rand = seededRandom(20250101);
  const jobs: DemoJob[] = [];
  for (let i = 0; i < HISTORY_COUNT; i++) {
    const technicianIndex = i % 6;
    // From two years back up to thirteen weeks ago, before the recent demo's twelve weeks.
    const daysAgo = 91 + Math.floor(((HISTORY_COUNT - 1 - i) / HISTORY_COUNT) * 640);
    const siteVisit = new Date(now.getTime() - daysAgo * DAY - 12 * HOUR);
    const first = vary(demoRecord(seededRandom(50_000 + i), technicianIndex, 0), rand);
    const submitted = new Date(siteVisit.getTime() + (4 + rand() * 20) * HOUR);
    const reviewer = i % 3;
    const r1 = review(rand, 1, reviewer, submitted, scoreRecord(rand, first, quality(first, rand), -1));
    const reviews: DemoReview[] = [r1];
    const revisions: DemoJob['revisions'] = [{ record: first, submittedAt: submitted }];
    if (r1.decision !== 'accept') {
      const fixed = demoRecord(seededRandom(50_000 + i), technicianIndex, 1);
      const resubmitted = new Date(r1.decidedAt.getTime() + (6 + rand() * 30) * HOUR);
      revisions.push({ record: fixed, submittedAt: resubmitted });
      reviews.push(review(rand, 2, (reviewer + 1) % 3, resubmitted, scoreRecord(rand, fixed, 1, -1), 'accept'));
    }
    jobs.push({
      claimReference: `MRK-25-${String(2001 + i)}`,
      street: `${10 + Math.floor(rand() * 190)} ${STREETS[i % STREETS.length]}`,
      city: 'Maraskell',
      postcode: `MK-${1000 + Math.floor(rand() * 9000)}`,
      propertyType: PROPERTY_TYPES[Math.floor(rand() * PROPERTY_TYPES.length)],
      lossType: LOSS_TYPES[Math.floor(rand() * LOSS_TYPES.length)],
      lossDate: isoDate(new Date(siteVisit.getTime() - 2 * DAY)),
      siteVisitDate: isoDate(siteVisit),
      dueAt: new Date(siteVisit.getTime() + 4 * DAY),
      priority: 'normal',
      status: 'accepted',
      technicianIndex,
      revisions,
      reviews,
      pausedAt: null,
      pausedMs: revisions.length > 1 ? revisions[1].submittedAt.getTime() - r1.decidedAt.getTime() : 0,
      draft: revisions.at(-1)!.record,
    });
  }
  return jobs;
}
