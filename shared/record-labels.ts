// The capture record's words, in one place: the form's field labels, the sections they sit
// in, and how a stored value reads to a person. The form, the revision diff and the delivery
// summary all take their wording from here, so a field is called the same thing everywhere.
import {
  CAMERA_CLASS_LABELS,
  type CaptureRecord,
  GAP_CAUSE_LABELS,
  HAZARD_LABELS,
  LEVEL_LABELS,
  REFLECTIVE_LABELS,
  SPLIT_REASON_LABELS,
  STRUCTURE_LABELS,
} from './capture-record';
import { LOSS_TYPE_LABELS } from './jobs';
import { AREA_LABEL, fromMetres, fromSquareMetres, type LengthUnit, roundTo } from './units';

export const RECORD_SECTIONS = [
  'camera',
  'levels',
  'rooms',
  'stations',
  'reflective',
  'models',
  'detachedStructures',
  'gaps',
  'damageAreas',
  'panoramas',
  'processing',
  'safety',
  'notes',
  'files',
] as const;
export type RecordSection = (typeof RECORD_SECTIONS)[number];

export const SECTION_LABELS: Record<RecordSection, string> = {
  camera: 'Camera and units',
  levels: 'Levels',
  rooms: 'Rooms',
  stations: 'Stations',
  reflective: 'Windows and glass',
  models: 'Models',
  detachedStructures: 'Detached structures',
  gaps: 'Coverage gaps',
  damageAreas: 'Damage areas',
  panoramas: 'Supplementary panoramas',
  processing: 'Processing',
  safety: 'Safety',
  notes: 'Notes',
  files: 'Files',
};

// Top-level scalar fields: their label and the form section that holds them.
export const SCALAR_FIELDS = {
  cameraClass: { label: 'Camera class', section: 'camera' },
  units: { label: 'Units for sizes', section: 'camera' },
  exteriorStations: { label: 'Exterior stations', section: 'stations' },
  totalStations: { label: 'Total stations in the capture', section: 'stations' },
  glazingFlagged: { label: 'Windows and glass doors (glazing) flagged', section: 'reflective' },
  notes: { label: 'Notes for the reviewer', section: 'notes' },
} as const satisfies Partial<Record<keyof CaptureRecord, { label: string; section: RecordSection }>>;

export const ROOM_FIELD_LABELS = {
  name: 'Room name',
  level: 'Level',
  lengthM: 'Length',
  widthM: 'Width',
  areaM2: 'Area (if not a rectangle)',
  stations: 'Stations in this room',
  doorwayStation: 'Station in the doorway (sees both rooms)',
} as const;

export const MODEL_FIELD_LABELS = {
  structure: 'Structure in this model',
  structureNote: 'Structure note',
  splitReason: 'Why it is a separate model',
  splitNote: 'Note on the split',
  platformReference: 'Model reference on the capture platform',
} as const;

export const DETACHED_FIELD_LABELS = {
  name: 'Structure name',
  structure: 'Kind',
  modelKey: 'Captured in',
  noModelReason: 'If not captured: why',
} as const;

export const GAP_FIELD_LABELS = {
  location: 'Where',
  cause: 'Cause',
  resolved: 'Resolved with extra stations later',
  note: 'Note',
} as const;

export const DAMAGE_FIELD_LABELS = {
  roomKey: 'Where',
  description: 'What the damage is',
  lossType: 'Loss type',
  stationNumbers: 'Stations that view it clearly',
  photoFileIds: 'Photos',
} as const;

export const GROUP_FIELD_LABELS = {
  panoramas: { count: 'How many', roomKeys: 'Rooms they cover' },
  processing: { confirmed: 'Processing started on the capture platform', confirmedAt: 'Confirmed at' },
  safety: { hazards: 'Hazards on site', note: 'Safety note' },
} as const;

export const levelStationsLabel = (level: keyof typeof LEVEL_LABELS) => `Stations on ${LEVEL_LABELS[level].toLowerCase()}`;
export const reflectiveFoundLabel = (kind: keyof typeof REFLECTIVE_LABELS) => `${REFLECTIVE_LABELS[kind]} found`;
export const reflectiveFlaggedLabel = (kind: keyof typeof REFLECTIVE_LABELS) => `${REFLECTIVE_LABELS[kind]} flagged`;

export const GLAZING_WORDS = { yes: 'Yes', no: 'No', partly: 'Partly' } as const;
export const UNIT_WORDS: Record<LengthUnit, string> = { ft: 'Feet', m: 'Metres' };

const EMPTY = '—';

export const yesNo = (value: unknown) => (value ? 'Yes' : 'No');

export function lengthText(metres: number | null, unit: LengthUnit) {
  return metres === null ? EMPTY : `${roundTo(fromMetres(metres, unit), 1)} ${unit}`;
}

export function areaText(sqm: number | null, unit: LengthUnit) {
  return sqm === null ? EMPTY : `${roundTo(fromSquareMetres(sqm, unit), 1)} ${AREA_LABEL[unit]}`;
}

export function plainText(value: unknown) {
  if (value === null || value === undefined || value === '') return EMPTY;
  return String(value);
}

// An enum value through its label map, or the empty mark.
export function labelled<K extends string>(labels: Record<K, string>, value: K | null | undefined) {
  return value ? (labels[value] ?? String(value)) : EMPTY;
}

export const VALUE_LABELS = {
  cameraClass: CAMERA_CLASS_LABELS,
  level: LEVEL_LABELS,
  structure: STRUCTURE_LABELS,
  splitReason: SPLIT_REASON_LABELS,
  cause: GAP_CAUSE_LABELS,
  hazard: HAZARD_LABELS,
  lossType: LOSS_TYPE_LABELS,
  glazing: GLAZING_WORDS,
  units: UNIT_WORDS,
} as const;
