import { type CaptureRecord, emptyCaptureRecord, type Room } from '../../shared/capture-record';
import { feetToMetres } from '../../shared/units';

export function room(overrides: Partial<Room> = {}): Room {
  return {
    key: 'r1',
    name: 'Kitchen',
    level: 'ground',
    lengthM: null,
    widthM: null,
    areaM2: null,
    stations: 1,
    doorwayStation: true,
    reflective: [],
    ...overrides,
  };
}

// A record with every required fact and nothing to warn about: one 12 ft × 15 ft kitchen
// with 5 stations from a tripod depth camera (180 ft² / 36 ft² = 5, common practice spacing).
export function completeRecord(overrides: Partial<CaptureRecord> = {}): CaptureRecord {
  return {
    ...emptyCaptureRecord(),
    cameraClass: 'tripod_depth',
    levels: [{ level: 'ground', stations: 5 }],
    rooms: [room({ lengthM: feetToMetres(12), widthM: feetToMetres(15), stations: 5 })],
    totalStations: 5,
    glazingFlagged: 'yes',
    models: [{ key: 'm1', structure: 'main_dwelling', structureNote: '', splitReason: null, splitNote: '', platformReference: 'MDL-1' }],
    processing: { confirmed: true, confirmedAt: '2026-11-30T15:00:00.000Z' },
    ...overrides,
  };
}

// A resubmission needs processing confirmed again, after the last submission.
export const confirmedNow = () => ({ confirmed: true, confirmedAt: new Date(Date.now() + 1).toISOString() });
