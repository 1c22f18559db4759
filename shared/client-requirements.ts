// Checks a capture record against a client's requirements. One pure function, used by the
// technician's pre-submit checks (phone and server) and by the reviewer's scoring screen, so
// both always flag the same rules for the same record.
import { type CaptureRecord, roomAreaM2 } from './capture-record';
import type { Requirement, RequirementParams, RequirementSeverity } from './client-programme';
import { LOSS_TYPE_LABELS, type LossType, type PropertyType } from './jobs';
import { expectedStations } from './station-spacing';
import { AREA_LABEL, fromMetres, fromSquareMetres, roundTo } from './units';
import type { VisitPlan } from './visit-plan';

export type RequirementFacts = {
  lossType: LossType;
  propertyType: PropertyType;
  siteVisitDate: string | null;
  plan?: VisitPlan | null;
};

export const REQUIREMENT_STATUSES = ['pass', 'fail', 'not_applicable'] as const;
export type RequirementStatus = (typeof REQUIREMENT_STATUSES)[number];
export const REQUIREMENT_STATUS_LABELS: Record<RequirementStatus, string> = {
  pass: 'Met',
  fail: 'Not met',
  not_applicable: 'Does not apply',
};

export type RequirementResult = {
  key: string;
  kind: Requirement['kind'];
  severity: RequirementSeverity;
  message: string;
  status: RequirementStatus;
  detail: string;
};

type Outcome = { status: RequirementStatus; detail: string };
const pass = (detail: string): Outcome => ({ status: 'pass', detail });
const fail = (detail: string): Outcome => ({ status: 'fail', detail });
const notApplicable = (detail: string): Outcome => ({ status: 'not_applicable', detail });

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const lossList = (types: LossType[]) => types.map((t) => LOSS_TYPE_LABELS[t].toLowerCase()).join(', ');
const HOUR_MS = 3_600_000;

function coversLoss(types: LossType[], facts: RequirementFacts): Outcome | null {
  if (types.length === 0 || types.includes(facts.lossType)) return null;
  return notApplicable(`Applies to ${lossList(types)} losses; this is a ${LOSS_TYPE_LABELS[facts.lossType].toLowerCase()} loss.`);
}

function exteriorStations(p: RequirementParams['exterior_stations'], record: CaptureRecord, facts: RequirementFacts): Outcome {
  const outside = coversLoss(p.lossTypes, facts);
  if (outside) return outside;
  const detail = `${plural(record.exteriorStations, 'exterior station')}; at least ${p.minStations} required.`;
  return record.exteriorStations >= p.minStations ? pass(detail) : fail(detail);
}

function atticCaptured(p: RequirementParams['attic_captured'], record: CaptureRecord, facts: RequirementFacts): Outcome {
  const outside = coversLoss(p.lossTypes, facts);
  if (outside) return outside;
  if (facts.propertyType === 'condo_unit') return notApplicable('A condo unit has no attic of its own.');
  const plannedAttic = facts.plan?.structures.find((s) => s.kind === 'attic');
  if (facts.plan && facts.plan.structures.length > 0 && !plannedAttic) return notApplicable('The visit plan lists no attic.');
  if (plannedAttic && !plannedAttic.inScope) return notApplicable("The visit plan puts the attic outside the claim's scope.");
  const captured =
    record.levels.some((l) => l.level === 'attic' && l.stations > 0) || record.rooms.some((r) => r.level === 'attic' && r.stations > 0);
  if (captured) return pass('The attic is captured.');
  const gap = record.gaps.find((g) => /attic/i.test(g.location));
  if (gap) return pass(`Not captured; the coverage gap at "${gap.location.trim()}" says why.`);
  return fail('The attic is neither captured nor explained by a coverage gap that names it.');
}

function detachedStructures(p: RequirementParams['detached_structures'], record: CaptureRecord): Outcome {
  const size = `${roundTo(fromSquareMetres(p.minAreaM2, record.units), 0)} ${AREA_LABEL[record.units]}`;
  // A structure whose size was not recorded counts: the rule cannot be shown not to apply.
  const covered = record.detachedStructures.filter((s) => s.areaM2 == null || s.areaM2 >= p.minAreaM2);
  if (covered.length === 0) return notApplicable(`No detached structure of ${size} or more.`);
  const short = covered.filter((s) => {
    const hasModel = s.modelKey !== null && record.models.some((m) => m.key === s.modelKey);
    return !hasModel && !s.noModelReason.trim();
  });
  if (short.length === 0) return pass(`${plural(covered.length, 'structure')} of ${size} or more, each captured or explained.`);
  return fail(`Neither captured nor explained: ${short.map((s) => s.name.trim() || 'unnamed structure').join(', ')}.`);
}

function damagePhotos(p: RequirementParams['damage_photos'], record: CaptureRecord): Outcome {
  if (record.damageAreas.length === 0) return notApplicable('No damage area is recorded.');
  const short = record.damageAreas.filter((a) => a.photoFileIds.length < p.minPhotos);
  if (short.length === 0) return pass(`Every damage area has at least ${plural(p.minPhotos, 'photo')}.`);
  const names = short.map((a, i) => `${a.description.trim() || `damage area ${i + 1}`} (${a.photoFileIds.length})`);
  return fail(`Fewer than ${plural(p.minPhotos, 'photo')}: ${names.join(', ')}.`);
}

function maxStationSpacing(p: RequirementParams['max_station_spacing'], record: CaptureRecord): Outcome {
  if (record.cameraClass === 'handheld_lidar') return notApplicable('A handheld lidar records a path, not stations.');
  const spacing = `${roundTo(fromMetres(p.maxSpacingM, record.units), 1)} ${record.units}`;
  const sized = record.rooms.filter((r) => roomAreaM2(r) !== null);
  if (sized.length === 0) return notApplicable('No room has a recorded size.');
  const short = sized
    .map((r) => ({ room: r, expected: expectedStations(roomAreaM2(r)!, p.maxSpacingM) }))
    .filter(({ room, expected }) => room.stations < expected);
  if (short.length === 0) return pass(`Every sized room has enough stations for ${spacing} spacing.`);
  const names = short.map(({ room, expected }) => `${room.name.trim() || 'unnamed room'} (${room.stations} of about ${expected})`);
  return fail(`Too few stations for ${spacing} spacing: ${names.join(', ')}.`);
}

// When the technician left the site: the plan's recorded time, else the end of the visit day.
export function visitEndedAt(facts: RequirementFacts): Date | null {
  const left = facts.plan?.onSite.leftAt;
  if (left) return new Date(left);
  return facts.siteVisitDate ? new Date(`${facts.siteVisitDate}T23:59:59Z`) : null;
}

function processingWithin(p: RequirementParams['processing_within'], record: CaptureRecord, facts: RequirementFacts): Outcome {
  const ended = visitEndedAt(facts);
  if (!ended) return notApplicable('No visit date or leaving time is recorded.');
  if (!record.processing.confirmed || !record.processing.confirmedAt) return fail('Processing is not confirmed yet.');
  const hours = (new Date(record.processing.confirmedAt).getTime() - ended.getTime()) / HOUR_MS;
  const detail = `Confirmed ${hours <= 0 ? 'before the visit ended' : `${roundTo(hours, 1)} h after the visit`}; the limit is ${p.hours} h.`;
  return hours <= p.hours ? pass(detail) : fail(detail);
}

function outcomeOf(rule: Requirement, record: CaptureRecord, facts: RequirementFacts): Outcome {
  switch (rule.kind) {
    case 'exterior_stations':
      return exteriorStations(rule.params, record, facts);
    case 'attic_captured':
      return atticCaptured(rule.params, record, facts);
    case 'detached_structures':
      return detachedStructures(rule.params, record);
    case 'damage_photos':
      return damagePhotos(rule.params, record);
    case 'max_station_spacing':
      return maxStationSpacing(rule.params, record);
    case 'processing_within':
      return processingWithin(rule.params, record, facts);
  }
}

export function evaluateRequirements(requirements: Requirement[], record: CaptureRecord, facts: RequirementFacts): RequirementResult[] {
  return requirements.map((rule) => ({
    key: rule.key,
    kind: rule.kind,
    severity: rule.severity,
    message: rule.message,
    ...outcomeOf(rule, record, facts),
  }));
}

// The record field each rule is about, so the pre-submit list can point at the right section.
export const REQUIREMENT_FIELD: Record<Requirement['kind'], string> = {
  exterior_stations: 'exteriorStations',
  attic_captured: 'levels',
  detached_structures: 'detachedStructures',
  damage_photos: 'damageAreas',
  max_station_spacing: 'rooms',
  processing_within: 'processing.confirmed',
};

export function requirementFinding(clientName: string, result: RequirementResult) {
  return { field: REQUIREMENT_FIELD[result.kind], message: `Required by ${clientName}: ${result.message} ${result.detail}` };
}

// The spacing a client's rule sets, which replaces the camera class's own in the room checks.
export function spacingOverrideM(requirements: Requirement[]): number | null {
  const rules = requirements.filter((r) => r.kind === 'max_station_spacing');
  return rules.length ? Math.min(...rules.map((r) => r.params.maxSpacingM)) : null;
}
