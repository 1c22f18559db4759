// The form edits numbers as text in the technician's chosen unit; the record stores SI.
// These two pure functions translate between them and report text that is not a number.
import { areaProblem, lengthProblem, RECORD_LIMITS, type WholeLimit, wholeNumberProblem } from '@/shared/capture-limits';
import {
  type CaptureRecord,
  type CoverageGap,
  type DamageArea,
  type DetachedStructure,
  LEVEL_KINDS,
  type LevelKind,
  type Model,
  REFLECTIVE_KINDS,
  type ReflectiveKind,
} from '@/shared/capture-record';
import { fromMetres, fromSquareMetres, type LengthUnit, roundTo, toMetres, toSquareMetres } from '@/shared/units';

export type RoomForm = {
  key: string;
  name: string;
  level: LevelKind;
  length: string;
  width: string;
  area: string;
  stations: string;
  doorwayStation: boolean;
  reflective: Record<ReflectiveKind, { found: string; flagged: string }>;
};

export type DamageAreaForm = Omit<DamageArea, 'stationNumbers'> & { stationNumbers: string };

export type FormValues = {
  cameraClass: CaptureRecord['cameraClass'];
  units: LengthUnit;
  levels: Record<LevelKind, { captured: boolean; stations: string }>;
  rooms: RoomForm[];
  exteriorStations: string;
  totalStations: string;
  glazingFlagged: CaptureRecord['glazingFlagged'];
  models: Model[];
  detachedStructures: DetachedStructure[];
  gaps: CoverageGap[];
  damageAreas: DamageAreaForm[];
  panoramas: { count: string; roomKeys: string[] };
  processing: CaptureRecord['processing'];
  safety: CaptureRecord['safety'];
  notes: string;
};

const text = (n: number | null | undefined, decimals = 2) => (n === null || n === undefined ? '' : String(roundTo(n, decimals)));
// A count nobody typed is stored as 0 but shown empty, so typing 5 gives 5, not 50.
const count = (n: number) => (n === 0 ? '' : String(n));

export function toFormValues(record: CaptureRecord): FormValues {
  const unit = record.units;
  const levels = Object.fromEntries(
    LEVEL_KINDS.map((level) => {
      const found = record.levels.find((l) => l.level === level);
      return [level, { captured: Boolean(found), stations: found ? String(found.stations) : '' }];
    }),
  ) as FormValues['levels'];
  return {
    cameraClass: record.cameraClass,
    units: unit,
    levels,
    rooms: record.rooms.map((room) => ({
      key: room.key,
      name: room.name,
      level: room.level,
      length: text(room.lengthM === null ? null : fromMetres(room.lengthM, unit)),
      width: text(room.widthM === null ? null : fromMetres(room.widthM, unit)),
      area: text(room.areaM2 === null ? null : fromSquareMetres(room.areaM2, unit), 1),
      stations: count(room.stations),
      doorwayStation: room.doorwayStation,
      reflective: Object.fromEntries(
        REFLECTIVE_KINDS.map((kind) => {
          const r = room.reflective.find((s) => s.kind === kind);
          return [kind, { found: r ? String(r.found) : '', flagged: r ? String(r.flagged) : '' }];
        }),
      ) as RoomForm['reflective'],
    })),
    exteriorStations: count(record.exteriorStations),
    totalStations: record.totalStations === null ? '' : String(record.totalStations),
    glazingFlagged: record.glazingFlagged,
    models: record.models,
    detachedStructures: record.detachedStructures,
    gaps: record.gaps,
    damageAreas: record.damageAreas.map((a) => ({ ...a, stationNumbers: a.stationNumbers.join(', ') })),
    panoramas: { count: count(record.panoramas.count), roomKeys: record.panoramas.roomKeys },
    processing: record.processing,
    safety: record.safety,
    notes: record.notes,
  };
}

export type Conversion = { record: CaptureRecord; errors: Record<string, string> };

export function toRecord(values: FormValues): Conversion {
  const errors: Record<string, string> = {};
  const unit = values.units;

  // A value that breaks a limit is marked at its field and left out of the saved record, so
  // one bad field never stops the rest from saving.
  const decimal = (field: string, raw: string, check: (n: number) => string | null): number | null => {
    const trimmed = raw.trim().replace(',', '.');
    if (trimmed === '') return null;
    const n = Number(trimmed);
    const problem = Number.isFinite(n) && n >= 0 ? check(n) : 'Enter a number, 0 or more';
    if (problem) {
      errors[field] = problem;
      return null;
    }
    return n;
  };
  const whole = (field: string, raw: string, fallback: number | null, limit: WholeLimit): number | null => {
    const trimmed = raw.trim();
    if (trimmed === '') return fallback;
    if (!/^\d+$/.test(trimmed)) {
      errors[field] = 'Enter a whole number, 0 or more';
      return fallback;
    }
    const problem = wholeNumberProblem(Number(trimmed), limit);
    if (problem) {
      errors[field] = problem;
      return fallback;
    }
    return Number(trimmed);
  };

  const rooms = values.rooms.map((room, i) => {
    const length = decimal(`rooms.${i}.length`, room.length, (n) => lengthProblem(n, unit, 'roomLengthM'));
    const width = decimal(`rooms.${i}.width`, room.width, (n) => lengthProblem(n, unit, 'roomWidthM'));
    const area = decimal(`rooms.${i}.area`, room.area, (n) => areaProblem(n, unit));
    return {
      key: room.key,
      name: room.name,
      level: room.level,
      lengthM: length === null ? null : toMetres(length, unit),
      widthM: width === null ? null : toMetres(width, unit),
      areaM2: area === null ? null : toSquareMetres(area, unit),
      stations: whole(`rooms.${i}.stations`, room.stations, 0, 'roomStations') ?? 0,
      doorwayStation: room.doorwayStation,
      reflective: REFLECTIVE_KINDS.flatMap((kind) => {
        const found = whole(`rooms.${i}.reflective.${kind}.found`, room.reflective[kind].found, 0, 'reflectiveCount') ?? 0;
        let flagged = whole(`rooms.${i}.reflective.${kind}.flagged`, room.reflective[kind].flagged, 0, 'reflectiveCount') ?? 0;
        if (flagged > found) {
          errors[`rooms.${i}.reflective.${kind}.flagged`] = 'Cannot be more than found';
          flagged = found;
        }
        return found === 0 && flagged === 0 ? [] : [{ kind, found, flagged }];
      }),
    };
  });

  const damageAreas = values.damageAreas.map((area, i) => {
    const parts = area.stationNumbers.split(/[\s,;]+/).filter(Boolean);
    const numbers = parts.map(Number);
    const valid = (n: number) => Number.isInteger(n) && n >= 1 && n <= RECORD_LIMITS.stationNumber;
    if (!numbers.every(valid))
      errors[`damageAreas.${i}.stationNumbers`] = `List station numbers from 1 to ${RECORD_LIMITS.stationNumber}, such as 4, 5, 12`;
    return { ...area, stationNumbers: numbers.filter(valid) };
  });

  const record: CaptureRecord = {
    cameraClass: values.cameraClass,
    units: unit,
    levels: LEVEL_KINDS.filter((level) => values.levels[level].captured).map((level) => ({
      level,
      stations: whole(`levels.${level}.stations`, values.levels[level].stations, 0, 'levelStations') ?? 0,
    })),
    rooms,
    exteriorStations: whole('exteriorStations', values.exteriorStations, 0, 'exteriorStations') ?? 0,
    totalStations: whole('totalStations', values.totalStations, null, 'totalStations'),
    glazingFlagged: values.glazingFlagged,
    models: values.models,
    detachedStructures: values.detachedStructures,
    gaps: values.gaps,
    damageAreas,
    panoramas: { count: whole('panoramas.count', values.panoramas.count, 0, 'panoramas') ?? 0, roomKeys: values.panoramas.roomKeys },
    processing: values.processing,
    safety: values.safety,
    notes: values.notes,
  };
  return { record, errors };
}

export function newKey(prefix: string) {
  return `${prefix}${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
}

export function emptyRoom(level: LevelKind = 'ground'): RoomForm {
  return {
    key: newKey('r'),
    name: '',
    level,
    length: '',
    width: '',
    area: '',
    stations: '',
    doorwayStation: true,
    reflective: Object.fromEntries(REFLECTIVE_KINDS.map((k) => [k, { found: '', flagged: '' }])) as RoomForm['reflective'],
  };
}
