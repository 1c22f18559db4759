import { emptyCaptureRecord } from '../../shared/capture-record';
import { checkCaptureRecord } from '../../shared/pre-submit-checks';
import { expectedStations, MAX_STATION_SPACING_M } from '../../shared/station-spacing';
import { feetToMetres, squareFeetToSquareMetres } from '../../shared/units';
import { completeRecord, room } from '../helpers/records';

describe('expected stations per room (common practice spacing, no published source)', () => {
  // Common practice: about 6 ft between stations for a tripod depth camera, 5 ft for a 360 camera.
  it('a 12 ft × 15 ft room (180 ft²) needs 5 stations at 6 ft: 180 / 36 = 5 exactly', () => {
    const area = squareFeetToSquareMetres(180);
    expect(expectedStations(area, MAX_STATION_SPACING_M.tripod_depth!)).toBe(5);
  });

  it('the same room needs 8 stations with a 360 camera at 5 ft: 180 / 25 = 7.2, rounded up', () => {
    expect(expectedStations(squareFeetToSquareMetres(180), MAX_STATION_SPACING_M.camera_360!)).toBe(8);
  });

  it('a closet still needs one station', () => {
    expect(expectedStations(squareFeetToSquareMetres(12), MAX_STATION_SPACING_M.tripod_depth!)).toBe(1);
  });

  it('has no spacing rule for handheld lidar, which records a path rather than stations', () => {
    expect(MAX_STATION_SPACING_M.handheld_lidar).toBeNull();
  });
});

describe('checkCaptureRecord', () => {
  it('finds nothing wrong with a complete, consistent record', () => {
    expect(checkCaptureRecord(completeRecord())).toEqual({ missing: [], warnings: [] });
  });

  it('blocks an empty record on every required fact', () => {
    const fields = checkCaptureRecord(emptyCaptureRecord())
      .missing.map((f) => f.field)
      .sort();
    expect(fields).toEqual(['cameraClass', 'glazingFlagged', 'levels', 'models', 'processing.confirmed', 'rooms', 'totalStations']);
  });

  it('blocks a total that is not rooms plus exterior', () => {
    const result = checkCaptureRecord(completeRecord({ totalStations: 7, exteriorStations: 1 }));
    expect(result.missing).toEqual([
      { field: 'totalStations', message: 'Total stations (7) must equal stations in rooms plus exterior (6).' },
    ]);
  });

  it('blocks until processing is confirmed', () => {
    const result = checkCaptureRecord(completeRecord({ processing: { confirmed: false, confirmedAt: null } }));
    expect(result.missing.map((f) => f.field)).toEqual(['processing.confirmed']);
  });

  it('warns, without blocking, when a room has fewer stations than its area suggests', () => {
    const record = completeRecord({
      rooms: [room({ lengthM: feetToMetres(12), widthM: feetToMetres(15), stations: 3 })],
      totalStations: 3,
      levels: [{ level: 'ground', stations: 3 }],
    });
    const result = checkCaptureRecord(record);
    expect(result.missing).toEqual([]);
    expect(result.warnings).toHaveLength(1);
    expect(result.warnings[0].field).toBe('rooms.0.stations');
    expect(result.warnings[0].message).toContain('about 5 expected at 6 ft spacing');
  });

  it('states the room size in the unit the technician chose', () => {
    const record = completeRecord({
      units: 'm',
      rooms: [room({ areaM2: 20, stations: 1 })],
      totalStations: 1,
      levels: [{ level: 'ground', stations: 1 }],
    });
    // 20 m² / 1.8288² m² = 5.98 → 6 stations.
    expect(checkCaptureRecord(record).warnings[0].message).toContain('about 20 m²; about 6 expected at 1.8 m spacing');
  });

  it('warns about a missing doorway station, unflagged reflective surfaces, open gaps and unseen damage', () => {
    const record = completeRecord({
      rooms: [
        room({
          lengthM: feetToMetres(12),
          widthM: feetToMetres(15),
          stations: 5,
          doorwayStation: false,
          reflective: [{ kind: 'mirror', found: 2, flagged: 1 }],
        }),
      ],
      gaps: [{ key: 'g1', location: 'Sunroom west wall', cause: 'direct_sun', resolved: false, note: '' }],
      damageAreas: [{ key: 'd1', roomKey: 'r1', description: 'Ceiling stain', lossType: 'water', stationNumbers: [], photoFileIds: [] }],
    });
    const fields = checkCaptureRecord(record).warnings.map((w) => w.field);
    expect(fields).toEqual(['rooms.0.doorwayStation', 'rooms.0.reflective.0', 'gaps.0.resolved', 'damageAreas.0.stationNumbers']);
  });

  it('warns about a detached structure with neither a model nor a reason', () => {
    const record = completeRecord({
      detachedStructures: [{ key: 's1', name: 'Garden shed', structure: 'shed', modelKey: null, noModelReason: '' }],
    });
    expect(checkCaptureRecord(record).warnings.map((w) => w.message)).toEqual(['Garden shed: no model and no reason given.']);
    const explained = completeRecord({
      detachedStructures: [{ key: 's1', name: 'Garden shed', structure: 'shed', modelKey: null, noModelReason: 'Locked, no key' }],
    });
    expect(checkCaptureRecord(explained).warnings).toEqual([]);
  });

  it('requires a reason for a split-out model', () => {
    const record = completeRecord({
      models: [
        { key: 'm1', structure: 'main_dwelling', structureNote: '', splitReason: null, splitNote: '', platformReference: 'MDL-1' },
        { key: 'm2', structure: 'detached_garage', structureNote: '', splitReason: null, splitNote: '', platformReference: 'MDL-2' },
      ],
    });
    expect(checkCaptureRecord(record).missing.map((f) => f.field)).toEqual(['models.1.splitReason']);
  });

  it("warns when a level's station count differs from its rooms", () => {
    const record = completeRecord({ levels: [{ level: 'ground', stations: 9 }] });
    expect(checkCaptureRecord(record).warnings.map((w) => w.field)).toEqual(['levels.ground']);
  });
});

describe('checks against facts outside the record', () => {
  const submittedAt = '2026-12-01T10:00:00.000Z';
  it('asks for processing to be confirmed again when the confirmation predates the last submission', () => {
    const stale = completeRecord({ processing: { confirmed: true, confirmedAt: '2026-12-01T09:00:00.000Z' } });
    const fresh = completeRecord({ processing: { confirmed: true, confirmedAt: '2026-12-01T11:00:00.000Z' } });
    expect(checkCaptureRecord(stale, { previousSubmittedAt: submittedAt }).missing.map((f) => f.field)).toEqual(['processing.confirmed']);
    expect(checkCaptureRecord(fresh, { previousSubmittedAt: submittedAt }).missing).toEqual([]);
    expect(checkCaptureRecord(stale).missing).toEqual([]);
  });

  it("warns when the station file's count on a level differs from the record's", () => {
    const record = completeRecord();
    const same = checkCaptureRecord(record, { stationFileLevels: [{ level: 'ground', stations: 5 }] });
    expect(same.warnings.filter((w) => w.field === 'levels')).toEqual([]);
    const differs = checkCaptureRecord(record, {
      stationFileLevels: [
        { level: 'ground', stations: 7 },
        { level: 'upper', stations: 3 },
      ],
    });
    expect(differs.warnings.filter((w) => w.field === 'levels').map((w) => w.message)).toEqual([
      'The station file has 7 stations on the ground floor; the record says 5.',
      'The station file has 3 stations on the upper floor; the record says none.',
    ]);
  });
});
