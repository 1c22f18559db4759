// Invented demo jobs for Tallowmere Reality Capture in the fictional city of Brambleford.
// Deterministic (seeded random numbers), so every machine gets the same demo.
import { type CaptureRecord, type LevelKind, type Room } from '../../shared/capture-record';
import type { JobStatus, LossType, Priority, PropertyType } from '../../shared/jobs';
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

const STREETS = ['Quillon Lane', 'Larkspur Row', 'Old Tannery Road', 'Wicklow Terrace', 'Heronsgate Close', 'Ashby Mews',
  'Copperbeech Drive', 'Fennick Street', 'Marrowdale Avenue', 'Sallow Court', 'Tinder Hill', 'Brackenridge Way'];
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

export type DemoJob = {
  claimReference: string;
  street: string;
  city: string;
  postcode: string;
  propertyType: PropertyType;
  lossType: LossType;
  lossDate: string;
  siteVisitDate: string | null;
  dueAt: Date;
  priority: Priority;
  status: JobStatus;
  technicianIndex: number;
  revisions: { record: CaptureRecord; submittedAt: Date }[];
  draft: CaptureRecord;
};

const DAY = 86_400_000;
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

// The last three weeks show every state of the loop; older jobs are finished.
const RECENT_STATES: JobStatus[] = ['draft', 'submitted', 'in_review', 'rework_requested', 'resubmitted', 'draft', 'submitted',
  'accepted', 'in_review', 'draft', 'rework_requested', 'submitted', 'resubmitted', 'draft', 'in_review'];

function statusFor(index: number, r: number): JobStatus {
  const recent = index - (60 - RECENT_STATES.length);
  if (recent >= 0) return RECENT_STATES[recent];
  return r < 0.88 ? 'accepted' : 'recapture_required';
}

function demoRecord(rand: () => number, variant: number): CaptureRecord {
  const cameraClass = rand() < 0.7 ? 'tripod_depth' : 'camera_360';
  const spacing = MAX_STATION_SPACING_M[cameraClass]!;
  const count = 4 + Math.floor(rand() * 5);
  const templates = ROOMS.slice(0, count);
  const rooms: Room[] = templates.map((t, i) => {
    const lengthM = feetToMetres(t.lengthFt);
    const widthM = feetToMetres(t.widthFt);
    const expected = expectedStations(lengthM * widthM, spacing);
    // Most rooms meet the rule of thumb; some fall a station or two short.
    const stations = Math.max(1, expected - (rand() < 0.2 ? 1 + Math.floor(rand() * 2) : 0));
    const hasMirror = t.name === 'Bathroom' || t.name === 'Main bedroom';
    const found = hasMirror ? 1 : 0;
    return {
      key: `r${i + 1}`,
      name: t.name,
      level: t.level,
      lengthM,
      widthM,
      areaM2: null,
      stations,
      doorwayStation: rand() > 0.15,
      reflective: found ? [{ kind: 'mirror', found, flagged: rand() < 0.8 + variant * 0.1 ? found : 0 }] : [],
    };
  });
  const exteriorStations = 4 + Math.floor(rand() * 6);
  const levels = [...new Set(rooms.map((r) => r.level))].map((level) => ({
    level,
    stations: rooms.filter((r) => r.level === level).reduce((s, r) => s + r.stations, 0),
  }));
  levels.push({ level: 'exterior', stations: exteriorStations });
  const totalStations = rooms.reduce((s, r) => s + r.stations, 0) + exteriorStations;
  const unresolvedGap = rand() < 0.25;
  return {
    cameraClass,
    units: 'ft',
    levels,
    rooms,
    exteriorStations,
    totalStations,
    glazingFlagged: rand() < 0.8 ? 'yes' : 'partly',
    models: [{ key: 'm1', structure: 'main_dwelling', structureNote: '', splitReason: null, splitNote: '', platformReference: `TRC-${Math.floor(rand() * 90000) + 10000}` }],
    detachedStructures: [],
    gaps: unresolvedGap ? [{ key: 'g1', location: 'Sunroom, west windows', cause: 'direct_sun', resolved: variant > 0, note: variant > 0 ? 'Recaptured at dusk' : '' }] : [],
    damageAreas: [{ key: 'd1', roomKey: 'r1', description: 'Ceiling stain about 3 ft across', lossType: 'water', stationNumbers: [2, 3], photoFileIds: [] }],
    panoramas: { count: rand() < 0.5 ? 2 : 0, roomKeys: ['r1'] },
    processing: { confirmed: true, confirmedAt: null },
    safety: { hazards: rand() < 0.2 ? ['standing_water'] : [], note: '' },
    notes: '',
  };
}

export function demoJobs(now = new Date()): DemoJob[] {
  const rand = seededRandom(20261201);
  const jobs: DemoJob[] = [];
  for (let i = 0; i < 60; i++) {
    const weeksAgo = Math.floor((59 - i) / 5);
    const recent = i - (60 - RECENT_STATES.length);
    // Open jobs were visited in the last few days, so some are still in time and some are late.
    const siteVisit = recent >= 0
      ? new Date(now.getTime() - (recent % 6) * DAY - 12 * 3_600_000)
      : new Date(now.getTime() - weeksAgo * 7 * DAY - Math.floor(rand() * 5) * DAY - 12 * 3_600_000);
    const loss = new Date(siteVisit.getTime() - (1 + Math.floor(rand() * 4)) * DAY);
    const status = statusFor(i, rand());
    const revisionsWanted =
      status === 'draft' ? 0 : status === 'resubmitted' ? 2 : status === 'accepted' && rand() < 0.3 ? 2 : 1;
    const revisions = Array.from({ length: revisionsWanted }, (_, n) => ({
      record: demoRecord(seededRandom(1000 + i), n),
      submittedAt: new Date(siteVisit.getTime() + (n + 1) * DAY),
    }));
    const priorityRoll = rand();
    jobs.push({
      claimReference: `BFD-26-${String(1001 + i)}`,
      street: `${10 + Math.floor(rand() * 190)} ${STREETS[i % STREETS.length]}`,
      city: 'Brambleford',
      postcode: `BF-${1000 + Math.floor(rand() * 9000)}`,
      propertyType: PROPERTY_TYPES[Math.floor(rand() * PROPERTY_TYPES.length)],
      lossType: LOSS_TYPES[Math.floor(rand() * LOSS_TYPES.length)],
      lossDate: isoDate(loss),
      siteVisitDate: status === 'draft' && rand() < 0.4 ? null : isoDate(siteVisit),
      dueAt: new Date(siteVisit.getTime() + 4 * DAY),
      priority: priorityRoll < 0.75 ? 'normal' : priorityRoll < 0.93 ? 'urgent' : 'catastrophe',
      status,
      technicianIndex: i % 6,
      revisions,
      draft: revisions.length ? revisions[revisions.length - 1].record : { ...demoRecord(seededRandom(1000 + i), 0), processing: { confirmed: false, confirmedAt: null } },
    });
  }
  return jobs;
}
