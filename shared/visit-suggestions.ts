// What Sightline suggests from a visit plan: the models, the level to start on, the stations
// and time to expect. Pure, so the phone suggests offline and the server checks the same way.
import { type CameraClass, LEVEL_KINDS, LEVEL_LABELS, type LevelKind, type SplitReason } from './capture-record';
import type { LossType } from './jobs';
import { expectedStations, MAX_STATION_SPACING_M } from './station-spacing';
import type { PlannedModel, PlannedRoom, PlannedStructure, PlanStructureKind, VisitConditions, VisitPlan } from './visit-plan';
import { PLAN_STRUCTURE_LABELS, RECORD_STRUCTURE, STRUCTURE_LEVEL } from './visit-plan';
import type { CameraClassSettings } from './visit-settings';

// Common practice (no published source): a tripod depth camera loses surfaces outdoors in
// direct daylight (its projected pattern is washed out); a 360 camera and a terrestrial laser
// scanner do not. Handheld lidar: from memory, works outdoors in sun. Not a lab result.
export const SUN_LIMITED: Record<CameraClass, boolean> = {
  tripod_depth: true,
  camera_360: false,
  handheld_lidar: false,
  laser_scanner: false,
};

export type OutdoorVerdict = { possible: boolean; reason: SplitReason | null; explanation: string };

export function outdoorStations(cameraClass: CameraClass | null, conditions: VisitConditions): OutdoorVerdict {
  if (conditions.outdoorBlocked)
    return { possible: false, reason: 'no_access', explanation: 'Outdoor stations are ruled out on site today.' };
  if (cameraClass && conditions.directSun && SUN_LIMITED[cameraClass])
    return {
      possible: false,
      reason: 'daylight',
      explanation: 'A depth camera on a tripod loses surfaces in direct sun (common practice), so no stations outdoors now.',
    };
  return { possible: true, reason: null, explanation: 'Stations outdoors are possible, so they can link the structures.' };
}

const inScope = (plan: Pick<VisitPlan, 'structures'>) => plan.structures.filter((s) => s.inScope);

// The structure the capture starts from: the main dwelling when it is in scope, else the first
// structure in scope.
export function anchorStructure(plan: Pick<VisitPlan, 'structures'>): PlannedStructure | null {
  const scoped = inScope(plan);
  return scoped.find((s) => s.kind === 'main_dwelling') ?? scoped[0] ?? null;
}

function describe(structures: PlannedStructure[]) {
  return structures.map((s) => s.name.trim() || PLAN_STRUCTURE_LABELS[s.kind]).join(', ');
}

// One model when every in-scope structure can be reached and linked by stations; a separate
// model for each structure that cannot be linked (no inside access, and outdoor stations not
// possible), with the reason for the split filled in.
export function suggestModels(plan: Pick<VisitPlan, 'structures' | 'cameraClass' | 'conditions'>): PlannedModel[] {
  const anchor = anchorStructure(plan);
  if (!anchor) return [];
  const outdoor = outdoorStations(plan.cameraClass, plan.conditions);
  const linked: PlannedStructure[] = [anchor];
  const apart: PlannedStructure[] = [];
  for (const s of inScope(plan)) {
    if (s === anchor) continue;
    if (s.reachableInside || outdoor.possible) linked.push(s);
    else apart.push(s);
  }
  const main: PlannedModel = {
    key: `model-${anchor.key}`,
    structureKeys: linked.map((s) => s.key),
    structure: RECORD_STRUCTURE[anchor.kind],
    structureNote: describe(linked),
    splitReason: null,
    splitNote: '',
  };
  return [
    main,
    ...apart.map((s) => ({
      key: `model-${s.key}`,
      structureKeys: [s.key],
      structure: RECORD_STRUCTURE[s.kind],
      structureNote: describe([s]),
      splitReason: outdoor.reason ?? 'no_access',
      splitNote: `${describe([s])}: no access from inside the main structure. ${outdoor.explanation}`,
    })),
  ];
}

// Which in-scope structures no model covers, and which more than one covers: the technician's
// changes to the models must keep each structure in exactly one.
export function modelCoverage(plan: Pick<VisitPlan, 'structures' | 'models'>) {
  const counts = new Map(inScope(plan).map((s) => [s.key, 0]));
  for (const model of plan.models) for (const key of model.structureKeys) if (counts.has(key)) counts.set(key, counts.get(key)! + 1);
  const byKey = new Map(plan.structures.map((s) => [s.key, s]));
  return {
    uncovered: [...counts].filter(([, n]) => n === 0).map(([key]) => byKey.get(key)!),
    twice: [...counts].filter(([, n]) => n > 1).map(([key]) => byKey.get(key)!),
  };
}

// The levels of the anchor model: its rooms' levels, plus attic and crawl space when they are
// in scope and linked into it.
export function plannedLevels(plan: Pick<VisitPlan, 'structures' | 'rooms'>): LevelKind[] {
  const levels = new Set<LevelKind>(plan.rooms.map((r) => r.level));
  for (const s of inScope(plan)) {
    const level = STRUCTURE_LEVEL[s.kind];
    if (level) levels.add(level);
  }
  return LEVEL_KINDS.filter((l) => levels.has(l));
}

// Common practice: start on the lowest level in scope, in a corner, and work into the
// adjacent rooms; the entrance is not required as the start. A crawl space entered from
// outside is its own model and does not decide where the dwelling's capture starts.
const BOTTOM_UP: LevelKind[] = ['crawl_space', 'basement', 'ground', 'upper', 'attic'];

export function suggestStartLevel(plan: Pick<VisitPlan, 'structures' | 'rooms' | 'cameraClass' | 'conditions'>): LevelKind | null {
  const models = suggestModels(plan);
  const mainKeys = new Set(models[0]?.structureKeys ?? []);
  const levels = new Set<LevelKind>(plan.rooms.map((r) => r.level));
  for (const s of inScope(plan)) {
    const level = STRUCTURE_LEVEL[s.kind];
    if (level && mainKeys.has(s.key)) levels.add(level);
  }
  return BOTTOM_UP.find((l) => levels.has(l)) ?? null;
}

export function startAdvice(level: LevelKind | null): string {
  if (!level) return 'Add the rooms to see where to start.';
  return `Start on the ${LEVEL_LABELS[level].toLowerCase()}, in a corner, and work into the adjacent rooms; the entrance need not be the start (common practice).`;
}

export type RoomEstimate = { key: string; name: string; areaM2: number | null; stations: number | null };

export function roomArea(room: Pick<PlannedRoom, 'lengthM' | 'widthM'>): number | null {
  return room.lengthM && room.widthM && room.lengthM > 0 && room.widthM > 0 ? room.lengthM * room.widthM : null;
}

// Stations per room from its rough size and the camera class's spacing (the same rule the
// pre-submit checks use); null where the size or the spacing is unknown (handheld lidar
// records a path, not stations).
export function roomEstimates(rooms: PlannedRoom[], cameraClass: CameraClass | null): RoomEstimate[] {
  const spacing = cameraClass ? MAX_STATION_SPACING_M[cameraClass] : null;
  return rooms.map((room) => {
    const areaM2 = roomArea(room);
    return {
      key: room.key,
      name: room.name,
      areaM2,
      stations: areaM2 !== null && spacing !== null ? expectedStations(areaM2, spacing) : null,
    };
  });
}

export type VisitEstimate = {
  rooms: RoomEstimate[];
  stations: number;
  // Rooms whose stations could not be estimated (no size yet).
  unsized: number;
  minutes: number | null;
};

// Time on site: a set-up allowance (walk-through, photos, packing up) plus a time per station,
// both per camera class (settings).
export function visitEstimate(
  plan: Pick<VisitPlan, 'rooms' | 'cameraClass'>,
  settings: Pick<CameraClassSettings, 'minutesPerStation' | 'setupMinutes'> | null,
): VisitEstimate {
  const rooms = roomEstimates(plan.rooms, plan.cameraClass);
  const stations = rooms.reduce((sum, r) => sum + (r.stations ?? 0), 0);
  const unsized = rooms.filter((r) => r.stations === null).length;
  const minutes =
    settings && settings.minutesPerStation !== null && plan.cameraClass
      ? Math.round(settings.setupMinutes + stations * settings.minutesPerStation)
      : null;
  return { rooms, stations, unsized, minutes };
}

// Minutes between arrival and leaving, when both are known and in order.
export function minutesOnSite(onSite: VisitPlan['onSite']): number | null {
  if (!onSite.arrivedAt || !onSite.leftAt) return null;
  const minutes = (Date.parse(onSite.leftAt) - Date.parse(onSite.arrivedAt)) / 60000;
  return Number.isFinite(minutes) && minutes >= 0 ? Math.round(minutes) : null;
}

export function formatMinutes(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

// Whether a structure is likely in the claim's scope, before the adjuster's notes are read:
// the dwelling and its attic and crawl space always; detached structures when the loss is one
// that reaches them (wind, hail and fire travel across a property; water and smoke usually stay
// in the dwelling). A starting point the technician confirms, not a rule.
export function suggestInScope(kind: PlanStructureKind, lossType: LossType): boolean {
  if (kind === 'main_dwelling' || kind === 'attic' || kind === 'crawl_space') return true;
  return lossType === 'wind' || lossType === 'hail' || lossType === 'fire';
}

// Planned against actual time on site over several visits, in words: the share over or under
// the plan says whether the estimates (or the settings behind them) fit this technician.
export function timeOnSiteText(visits: { timed: number; plannedMinutes: number; actualMinutes: number }): string {
  if (visits.timed === 0) return 'No timed visits';
  const share =
    visits.plannedMinutes > 0 ? Math.round(((visits.actualMinutes - visits.plannedMinutes) / visits.plannedMinutes) * 100) : null;
  const against =
    share === null ? '' : share === 0 ? ', as planned' : ` (${share > 0 ? '+' : '−'}${Math.abs(share)} % ${share > 0 ? 'over' : 'under'})`;
  return `${visits.timed} visit${visits.timed === 1 ? '' : 's'}: planned ${formatMinutes(visits.plannedMinutes)}, actual ${formatMinutes(visits.actualMinutes)}${against}`;
}
