// The capture record: what a technician submits about a finished capture. Lengths are stored
// in metres and areas in square metres, whatever unit the technician typed in.
import type { LossType } from './jobs';
import type { LengthUnit } from './units';

export const CAMERA_CLASSES = ['tripod_depth', 'camera_360', 'handheld_lidar', 'laser_scanner'] as const;
export type CameraClass = (typeof CAMERA_CLASSES)[number];
export const CAMERA_CLASS_LABELS: Record<CameraClass, string> = {
  tripod_depth: 'Depth camera on tripod',
  camera_360: '360 camera',
  handheld_lidar: 'Handheld lidar',
  laser_scanner: 'Terrestrial laser scanner',
};

export const LEVEL_KINDS = ['basement', 'crawl_space', 'ground', 'upper', 'attic', 'exterior'] as const;
export type LevelKind = (typeof LEVEL_KINDS)[number];
export const LEVEL_LABELS: Record<LevelKind, string> = {
  basement: 'Basement',
  crawl_space: 'Crawl space',
  ground: 'Ground floor',
  upper: 'Upper floor',
  attic: 'Attic',
  exterior: 'Exterior',
};

export const REFLECTIVE_KINDS = ['mirror', 'glass_door', 'glossy_panel', 'other'] as const;
export type ReflectiveKind = (typeof REFLECTIVE_KINDS)[number];
export const REFLECTIVE_LABELS: Record<ReflectiveKind, string> = {
  mirror: 'Mirror',
  glass_door: 'Glass door',
  glossy_panel: 'Glossy panel',
  other: 'Other',
};

export const GLAZING_FLAGGED = ['yes', 'no', 'partly'] as const;
export type GlazingFlagged = (typeof GLAZING_FLAGGED)[number];

export const STRUCTURES = ['main_dwelling', 'detached_garage', 'shed', 'crawl_space', 'other'] as const;
export type Structure = (typeof STRUCTURES)[number];
export const STRUCTURE_LABELS: Record<Structure, string> = {
  main_dwelling: 'Main dwelling',
  detached_garage: 'Detached garage',
  shed: 'Shed',
  crawl_space: 'Crawl space',
  other: 'Other structure',
};

export const SPLIT_REASONS = ['no_access', 'daylight', 'client_request', 'other'] as const;
export type SplitReason = (typeof SPLIT_REASONS)[number];
export const SPLIT_REASON_LABELS: Record<SplitReason, string> = {
  no_access: 'No access from the main structure',
  daylight: 'Daylight too strong for the camera outdoors',
  client_request: 'Client request',
  other: 'Other',
};

export const GAP_CAUSES = ['direct_sun', 'infrared_washout', 'no_access', 'unsafe', 'contents', 'other'] as const;
export type GapCause = (typeof GAP_CAUSES)[number];
export const GAP_CAUSE_LABELS: Record<GapCause, string> = {
  direct_sun: 'Direct sun',
  infrared_washout: 'Infrared washout on bright walls',
  no_access: 'No access / locked',
  unsafe: 'Unsafe',
  contents: 'Furniture or contents',
  other: 'Other',
};

export const HAZARDS = [
  'standing_water',
  'live_wiring',
  'unsafe_attic_decking',
  'mould',
  'roof_access',
  'fire_structure',
  'soot',
  'crawl_space_entry',
  'ladders',
] as const;
export type Hazard = (typeof HAZARDS)[number];
export const HAZARD_LABELS: Record<Hazard, string> = {
  standing_water: 'Standing water',
  live_wiring: 'Live wiring',
  unsafe_attic_decking: 'Unsafe attic decking',
  mould: 'Mould',
  roof_access: 'Roof access',
  fire_structure: 'Fire-weakened structure',
  soot: 'Soot and ash',
  crawl_space_entry: 'Crawl-space entry',
  ladders: 'Ladders',
};

export type ReflectiveCount = { kind: ReflectiveKind; found: number; flagged: number };

export type Room = {
  key: string;
  name: string;
  level: LevelKind;
  lengthM: number | null;
  widthM: number | null;
  // Used when the room is not a rectangle; otherwise length × width.
  areaM2: number | null;
  stations: number;
  doorwayStation: boolean;
  reflective: ReflectiveCount[];
};

export type LevelCount = { level: LevelKind; stations: number };

export type Model = {
  key: string;
  structure: Structure;
  structureNote: string;
  // Only for a model split out of the main capture.
  splitReason: SplitReason | null;
  splitNote: string;
  platformReference: string;
};

export type DetachedStructure = {
  key: string;
  name: string;
  structure: Structure;
  modelKey: string | null;
  noModelReason: string;
  // Footprint, when measured: a client's rule may cover only structures over a given area.
  areaM2?: number | null;
};

export type CoverageGap = { key: string; location: string; cause: GapCause; resolved: boolean; note: string };

export type DamageArea = {
  key: string;
  roomKey: string;
  description: string;
  lossType: LossType;
  stationNumbers: number[];
  photoFileIds: number[];
};

export type CaptureRecord = {
  cameraClass: CameraClass | null;
  units: LengthUnit;
  levels: LevelCount[];
  rooms: Room[];
  exteriorStations: number;
  totalStations: number | null;
  glazingFlagged: GlazingFlagged | null;
  models: Model[];
  detachedStructures: DetachedStructure[];
  gaps: CoverageGap[];
  damageAreas: DamageArea[];
  panoramas: { count: number; roomKeys: string[] };
  processing: { confirmed: boolean; confirmedAt: string | null };
  safety: { hazards: Hazard[]; note: string };
  notes: string;
};

export function emptyCaptureRecord(): CaptureRecord {
  return {
    cameraClass: null,
    units: 'ft',
    levels: [],
    rooms: [],
    exteriorStations: 0,
    totalStations: null,
    glazingFlagged: null,
    models: [],
    detachedStructures: [],
    gaps: [],
    damageAreas: [],
    panoramas: { count: 0, roomKeys: [] },
    processing: { confirmed: false, confirmedAt: null },
    safety: { hazards: [], note: '' },
    notes: '',
  };
}

export function roomAreaM2(room: Pick<Room, 'lengthM' | 'widthM' | 'areaM2'>): number | null {
  if (room.areaM2 !== null && room.areaM2 > 0) return room.areaM2;
  if (room.lengthM !== null && room.widthM !== null && room.lengthM > 0 && room.widthM > 0) return room.lengthM * room.widthM;
  return null;
}

export function roomStationSum(record: Pick<CaptureRecord, 'rooms' | 'exteriorStations'>) {
  return record.rooms.reduce((sum, room) => sum + room.stations, 0) + record.exteriorStations;
}
