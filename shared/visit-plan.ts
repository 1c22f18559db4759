// The visit plan: what a technician decides at the door before the first station — which
// structures are in the claim's scope, which camera, how many models, where to start, the
// rooms, the hazards and the kit. It is a draft like the capture record (autosaved, kept on
// the phone offline, version-checked) and fills most of the record.
import type { CameraClass, Hazard, LevelKind, SplitReason, Structure } from './capture-record';
import type { LengthUnit } from './units';

// What can stand on a property, as the plan names it. Attic and crawl space are parts of the
// dwelling, listed here because whether they can be reached from inside decides the models.
export const PLAN_STRUCTURE_KINDS = ['main_dwelling', 'detached_garage', 'shed', 'other', 'crawl_space', 'attic'] as const;
export type PlanStructureKind = (typeof PLAN_STRUCTURE_KINDS)[number];
export const PLAN_STRUCTURE_LABELS: Record<PlanStructureKind, string> = {
  main_dwelling: 'Main dwelling',
  detached_garage: 'Detached garage',
  shed: 'Shed',
  other: 'Other outbuilding',
  crawl_space: 'Crawl space',
  attic: 'Attic',
};

// The record's structure for each kind (the attic belongs to the dwelling).
export const RECORD_STRUCTURE: Record<PlanStructureKind, Structure> = {
  main_dwelling: 'main_dwelling',
  detached_garage: 'detached_garage',
  shed: 'shed',
  other: 'other',
  crawl_space: 'crawl_space',
  attic: 'main_dwelling',
};

// The level a structure adds to the record, for those that are levels of the dwelling.
export const STRUCTURE_LEVEL: Partial<Record<PlanStructureKind, LevelKind>> = { crawl_space: 'crawl_space', attic: 'attic' };

export type PlannedStructure = {
  key: string;
  kind: PlanStructureKind;
  name: string;
  // Can be walked to from inside the main structure, so stations link it without going outdoors
  // (a door from the kitchen to the garage, an attic hatch, a crawl-space hatch in a closet).
  reachableInside: boolean;
  inScope: boolean;
  scopeNote: string;
};

export type PlannedModel = {
  key: string;
  structureKeys: string[];
  structure: Structure;
  structureNote: string;
  // Null for the first (main) model; every split-out model has one.
  splitReason: SplitReason | null;
  splitNote: string;
};

export type PlannedRoom = {
  key: string;
  name: string;
  level: LevelKind;
  // Rough size, stored in metres like the record.
  lengthM: number | null;
  widthM: number | null;
};

export type VisitConditions = {
  // Direct sun on the outside walls now.
  directSun: boolean;
  // Outdoor stations ruled out for another reason (rain, a locked gate, a dog, a steep yard).
  outdoorBlocked: boolean;
};

export type VisitPlan = {
  structures: PlannedStructure[];
  cameraClass: CameraClass | null;
  conditions: VisitConditions;
  models: PlannedModel[];
  // True once the technician accepted (or changed) the suggested models.
  modelsAccepted: boolean;
  startLevel: LevelKind | null;
  units: LengthUnit;
  rooms: PlannedRoom[];
  hazards: Hazard[];
  kitTicked: string[];
  // Arrival is stamped when the plan is started; leaving when the technician says so.
  onSite: { arrivedAt: string | null; leftAt: string | null };
  notes: string;
};

export function emptyVisitPlan(): VisitPlan {
  return {
    structures: [],
    cameraClass: null,
    conditions: { directSun: false, outdoorBlocked: false },
    models: [],
    modelsAccepted: false,
    startLevel: null,
    units: 'ft',
    rooms: [],
    hazards: [],
    kitTicked: [],
    onSite: { arrivedAt: null, leftAt: null },
    notes: '',
  };
}

export const PLAN_LIMITS = {
  structures: 12,
  rooms: 80,
  models: 12,
  name: 80,
  note: 500,
  roomLengthM: 100,
  kitItems: 30,
  kitItem: 120,
} as const;
