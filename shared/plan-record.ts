// Between the visit plan and the capture record: the record a plan fills in, which of its
// values still hold what the plan put there, and what the plan promised that the record lacks.
import {
  type CaptureRecord,
  type DetachedStructure,
  emptyCaptureRecord,
  type LevelCount,
  type Model,
  type Room,
  type Structure,
} from './capture-record';
import { type PlannedStructure, STRUCTURE_LEVEL, type VisitPlan } from './visit-plan';
import { PLAN_STRUCTURE_LABELS } from './visit-plan';
import { plannedLevels, roomEstimates } from './visit-suggestions';

const DETACHED_KINDS = new Set(['detached_garage', 'shed', 'other']);
const isDetached = (s: PlannedStructure) => DETACHED_KINDS.has(s.kind);
const nameOf = (s: PlannedStructure) => s.name.trim() || PLAN_STRUCTURE_LABELS[s.kind];
const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

export function recordRoomsFromPlan(plan: VisitPlan): Room[] {
  const estimates = roomEstimates(plan.rooms, plan.cameraClass);
  return plan.rooms.map((room, i) => ({
    key: room.key,
    name: room.name,
    level: room.level,
    lengthM: room.lengthM,
    widthM: room.widthM,
    areaM2: null,
    stations: estimates[i].stations ?? 0,
    doorwayStation: false,
    reflective: [],
  }));
}

function modelsFromPlan(plan: VisitPlan): Model[] {
  return plan.models.map((m) => ({
    key: m.key,
    structure: m.structure,
    structureNote: m.structureNote,
    splitReason: m.splitReason,
    splitNote: m.splitNote,
    platformReference: '',
  }));
}

// Every detached structure on the property goes into the record: in scope with the model that
// covers it, out of scope with the scope note as the reason it has no model.
function detachedFromPlan(plan: VisitPlan): DetachedStructure[] {
  return plan.structures.filter(isDetached).map((s) => ({
    key: s.key,
    name: nameOf(s),
    structure: s.kind as Structure,
    modelKey: s.inScope ? (plan.models.find((m) => m.structureKeys.includes(s.key))?.key ?? null) : null,
    noModelReason: s.inScope ? '' : `Not in the claim's scope${s.scopeNote.trim() ? `: ${s.scopeNote.trim()}` : '.'}`,
  }));
}

function levelsFromPlan(plan: VisitPlan, rooms: Room[]): LevelCount[] {
  return plannedLevels(plan).map((level) => ({
    level,
    stations: rooms.filter((r) => r.level === level).reduce((sum, r) => sum + r.stations, 0),
  }));
}

// The record a plan fills: camera, units, models and split reasons, detached structures,
// levels, rooms with rough sizes and expected stations, hazards. Everything stays editable;
// counts the technician did not take are the plan's estimate until they are corrected.
export function recordFromPlan(plan: VisitPlan, base: CaptureRecord = emptyCaptureRecord()): CaptureRecord {
  const rooms = recordRoomsFromPlan(plan);
  return {
    ...base,
    cameraClass: plan.cameraClass ?? base.cameraClass,
    units: plan.units,
    rooms,
    levels: levelsFromPlan(plan, rooms),
    models: modelsFromPlan(plan),
    detachedStructures: detachedFromPlan(plan),
    safety: { ...base.safety, hazards: [...plan.hazards] },
  };
}

// A record nothing has been typed into yet, so the plan may fill it without losing anything.
export function isUntouchedRecord(record: CaptureRecord): boolean {
  return JSON.stringify(record) === JSON.stringify(emptyCaptureRecord());
}

// The values of the record that still hold what the plan put there: shown as "from the plan"
// so the technician confirms them (the station counts above all, which are estimates).
export type PlanOrigin = { rooms: Record<string, { name: boolean; size: boolean; stations: boolean }>; models: Set<string> };

export function planOrigin(record: CaptureRecord, plan: VisitPlan | null): PlanOrigin {
  const origin: PlanOrigin = { rooms: {}, models: new Set() };
  if (!plan) return origin;
  const planned = new Map(recordRoomsFromPlan(plan).map((r) => [r.key, r]));
  for (const room of record.rooms) {
    const p = planned.get(room.key);
    if (!p) continue;
    origin.rooms[room.key] = {
      name: p.name === room.name,
      size: p.lengthM === room.lengthM && p.widthM === room.widthM && room.areaM2 === null,
      stations: p.stations === room.stations,
    };
  }
  for (const model of modelsFromPlan(plan)) {
    const m = record.models.find((r) => r.key === model.key);
    if (m && m.structure === model.structure && m.splitReason === model.splitReason && m.splitNote === model.splitNote)
      origin.models.add(m.key);
  }
  return origin;
}

export type PlanFinding = { field: string; message: string };

// What the plan expected that the record does not show: a structure in scope neither captured
// nor explained, a planned model missing, a planned room absent. Warnings: plans change on site.
export function planWarnings(record: CaptureRecord, plan: VisitPlan | null): PlanFinding[] {
  if (!plan) return [];
  const found: PlanFinding[] = [];
  const levels = new Set([...record.levels.map((l) => l.level), ...record.rooms.map((r) => r.level)]);
  for (const s of plan.structures.filter((x) => x.inScope)) {
    const level = STRUCTURE_LEVEL[s.kind];
    if (s.kind === 'main_dwelling') continue;
    if (level) {
      const explained = record.gaps.some(
        (g) => sameName(g.location, nameOf(s)) || g.location.toLowerCase().includes(PLAN_STRUCTURE_LABELS[s.kind].toLowerCase()),
      );
      if (!levels.has(level) && !explained)
        found.push({
          field: 'levels',
          message: `Planned: ${nameOf(s)}. It is not among the levels captured, and no coverage gap explains it.`,
        });
      continue;
    }
    const entry = record.detachedStructures.find((d) => d.key === s.key || sameName(d.name, nameOf(s)));
    const captured = entry?.modelKey && record.models.some((m) => m.key === entry.modelKey);
    if (!captured && !entry?.noModelReason.trim())
      found.push({ field: 'detachedStructures', message: `Planned: ${nameOf(s)}. It is neither captured in a model nor explained.` });
  }
  for (const model of plan.models) {
    if (!record.models.some((m) => m.key === model.key))
      found.push({ field: 'models', message: `Planned model missing: ${model.structureNote || model.structure}.` });
  }
  for (const room of plan.rooms) {
    if (!record.rooms.some((r) => r.key === room.key || sameName(r.name, room.name)))
      found.push({ field: 'rooms', message: `Planned room missing: ${room.name.trim() || 'unnamed room'}.` });
  }
  return found;
}
