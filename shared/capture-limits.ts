// The limits of a capture record's fields, in one place: the form checks them before sending
// (and names the limit in the technician's unit), the server's validators enforce them.
import { fromMetres, fromSquareMetres, type LengthUnit, roundTo } from './units';

export const RECORD_LIMITS = {
  levels: 10,
  levelStations: 2000,
  rooms: 200,
  roomName: 80,
  roomLengthM: 200,
  roomWidthM: 200,
  roomAreaM2: 5000,
  roomStations: 500,
  reflectiveCount: 100,
  exteriorStations: 2000,
  totalStations: 5000,
  models: 20,
  detachedStructures: 20,
  gaps: 100,
  damageAreas: 100,
  stationNumber: 5000,
  stationNumbersPerArea: 200,
  photosPerArea: 50,
  panoramas: 500,
  shortText: 120,
  longText: 500,
  safetyNote: 1000,
  notes: 4000,
} as const;

export type WholeLimit = 'levelStations' | 'roomStations' | 'reflectiveCount' | 'exteriorStations' | 'totalStations' | 'panoramas';

export function wholeNumberProblem(value: number, limit: WholeLimit): string | null {
  const max = RECORD_LIMITS[limit];
  return Number.isInteger(value) && value >= 0 && value <= max ? null : `A whole number from 0 to ${max}`;
}

// A length typed in the record's unit, checked against its limit in metres.
export function lengthProblem(value: number, unit: LengthUnit, limit: 'roomLengthM' | 'roomWidthM'): string | null {
  if (!Number.isFinite(value) || value < 0) return 'Enter a number, 0 or more';
  const maxM = RECORD_LIMITS[limit];
  const max = fromMetres(maxM, unit);
  if (value <= max + 1e-9) return null;
  return unit === 'm' ? `At most ${maxM} m` : `At most ${roundTo(max, 0)} ft (${maxM} m)`;
}

export function areaProblem(value: number, unit: LengthUnit): string | null {
  if (!Number.isFinite(value) || value < 0) return 'Enter a number, 0 or more';
  const maxM2 = RECORD_LIMITS.roomAreaM2;
  const max = fromSquareMetres(maxM2, unit);
  if (value <= max + 1e-6) return null;
  return unit === 'm' ? `At most ${maxM2} m²` : `At most ${roundTo(max, 0)} ft² (${maxM2} m²)`;
}
