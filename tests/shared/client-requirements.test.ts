// Every client rule kind, with the edge cases: a loss type the rule does not cover, no item the
// rule is about (does not apply), and the boundary values. Spacing figures are checked against
// common practice (no published source): 180 ft² at 6 ft spacing needs 180 / 36 = 5 stations.
import type { CaptureRecord } from '../../shared/capture-record';
import { newRequirement, type Requirement } from '../../shared/client-programme';
import { evaluateRequirements, type RequirementFacts, spacingOverrideM, visitEndedAt } from '../../shared/client-requirements';
import { checkCaptureRecord } from '../../shared/pre-submit-checks';
import { readProgramme } from '../../shared/programme-input';
import { feetToMetres } from '../../shared/units';
import { emptyVisitPlan } from '../../shared/visit-plan';
import { completeRecord } from '../helpers/records';

const facts = (overrides: Partial<RequirementFacts> = {}): RequirementFacts => ({
  lossType: 'wind',
  propertyType: 'single_family',
  siteVisitDate: '2026-11-30',
  ...overrides,
});
const one = (rule: Requirement, record: CaptureRecord, f: RequirementFacts = facts()) => evaluateRequirements([rule], record, f)[0];

describe('exterior stations for some losses', () => {
  const rule = newRequirement('exterior_stations', 'ext');
  it('fails a wind loss with fewer exterior stations than required, passes at the minimum', () => {
    expect(one(rule, completeRecord({ exteriorStations: 3 })).status).toBe('fail');
    expect(one(rule, completeRecord({ exteriorStations: 4 })).status).toBe('pass');
  });
  it('does not apply to a loss type it does not list', () => {
    const result = one(rule, completeRecord({ exteriorStations: 0 }), facts({ lossType: 'water' }));
    expect(result.status).toBe('not_applicable');
    expect(result.detail).toMatch(/water loss/);
  });
});

describe('attic captured or explained', () => {
  const rule = newRequirement('attic_captured', 'attic');
  it('fails when the attic is neither captured nor named by a coverage gap', () => {
    expect(one(rule, completeRecord()).status).toBe('fail');
  });
  it('passes when captured, or when a coverage gap names the attic', () => {
    expect(one(rule, completeRecord({ levels: [{ level: 'attic', stations: 2 }] })).status).toBe('pass');
    const gap = { key: 'g', location: 'Attic hatch', cause: 'unsafe' as const, resolved: false, note: 'Decking rotten' };
    expect(one(rule, completeRecord({ gaps: [gap] })).status).toBe('pass');
  });
  it('does not apply to a condo unit, or when the plan lists no attic', () => {
    expect(one(rule, completeRecord(), facts({ propertyType: 'condo_unit' })).status).toBe('not_applicable');
    const plan = {
      ...emptyVisitPlan(),
      structures: [{ key: 's', kind: 'main_dwelling' as const, name: 'House', reachableInside: true, inScope: true, scopeNote: '' }],
    };
    expect(one(rule, completeRecord(), facts({ plan })).status).toBe('not_applicable');
  });
});

describe('detached structures of a given size', () => {
  const rule = { ...newRequirement('detached_structures', 'det'), params: { minAreaM2: 10 } } as Requirement;
  const shed = (areaM2: number | null, noModelReason = '') => ({
    key: 'd',
    name: 'Shed',
    structure: 'shed' as const,
    modelKey: null,
    noModelReason,
    areaM2,
  });
  it('fails a large structure with no model and no reason, and one of unrecorded size', () => {
    expect(one(rule, completeRecord({ detachedStructures: [shed(12)] })).status).toBe('fail');
    expect(one(rule, completeRecord({ detachedStructures: [shed(null)] })).status).toBe('fail');
  });
  it('passes with a reason; does not apply below the size or with no structure', () => {
    expect(one(rule, completeRecord({ detachedStructures: [shed(12, 'Locked, no key')] })).status).toBe('pass');
    expect(one(rule, completeRecord({ detachedStructures: [shed(9.9)] })).status).toBe('not_applicable');
    expect(one(rule, completeRecord()).status).toBe('not_applicable');
  });
});

describe('photos per damage area', () => {
  const rule = newRequirement('damage_photos', 'ph'); // at least 2
  const area = (photoFileIds: number[]) => ({
    key: 'a',
    roomKey: 'r1',
    description: 'Ceiling stain',
    lossType: 'water' as const,
    stationNumbers: [1],
    photoFileIds,
  });
  it('fails below the count and passes at it', () => {
    expect(one(rule, completeRecord({ damageAreas: [area([1])] })).detail).toMatch(/Ceiling stain \(1\)/);
    expect(one(rule, completeRecord({ damageAreas: [area([1, 2])] })).status).toBe('pass');
  });
  it('does not apply without damage areas', () => {
    expect(one(rule, completeRecord()).status).toBe('not_applicable');
  });
});

describe('maximum station spacing', () => {
  const at = (maxSpacingM: number) => ({ ...newRequirement('max_station_spacing', 'sp'), params: { maxSpacingM } }) as Requirement;
  it('passes 5 stations in 180 ft² at 6 ft, fails them at 1.5 m (about 8 needed)', () => {
    expect(one(at(feetToMetres(6)), completeRecord()).status).toBe('pass');
    const tight = one(at(1.5), completeRecord());
    expect(tight.status).toBe('fail');
    expect(tight.detail).toMatch(/Kitchen \(5 of about 8\)/);
  });
  it('does not apply to a handheld lidar or to rooms without a size', () => {
    expect(one(at(1.5), completeRecord({ cameraClass: 'handheld_lidar' })).status).toBe('not_applicable');
    const unsized = completeRecord();
    unsized.rooms = unsized.rooms.map((r) => ({ ...r, lengthM: null, widthM: null, areaM2: null }));
    expect(one(at(1.5), unsized).status).toBe('not_applicable');
  });
  it('replaces the camera class spacing in the room checks', () => {
    const rule = at(1.5);
    const result = checkCaptureRecord(completeRecord(), { client: { name: 'Client A', requirements: [rule], facts: facts() } });
    expect(result.warnings.filter((w) => w.field === 'rooms.0.stations')).toEqual([]);
    expect(spacingOverrideM([rule, at(1)])).toBe(1);
  });
});

describe('processing confirmed soon after the visit', () => {
  const rule = newRequirement('processing_within', 'proc'); // 24 h
  const confirmedAt = (iso: string) => completeRecord({ processing: { confirmed: true, confirmedAt: iso } });
  it('measures from the end of the visit day, or from the plan’s leaving time', () => {
    expect(visitEndedAt(facts())!.toISOString()).toBe('2026-11-30T23:59:59.000Z');
    expect(one(rule, confirmedAt('2026-12-01T23:59:00.000Z')).status).toBe('pass');
    expect(one(rule, confirmedAt('2026-12-02T00:30:00.000Z')).status).toBe('fail');
    const plan = { ...emptyVisitPlan(), onSite: { arrivedAt: '2026-11-30T09:00:00.000Z', leftAt: '2026-11-30T12:00:00.000Z' } };
    expect(one(rule, confirmedAt('2026-12-01T13:00:00.000Z'), facts({ plan })).status).toBe('fail');
  });
  it('fails while unconfirmed; does not apply without a visit date', () => {
    expect(one(rule, completeRecord({ processing: { confirmed: false, confirmedAt: null } })).status).toBe('fail');
    expect(one(rule, completeRecord(), facts({ siteVisitDate: null })).status).toBe('not_applicable');
  });
});

describe('pre-submit checks with a client programme', () => {
  it('marks failing rules as the client’s, blocking or warning as the rule says', () => {
    const blocking = { ...newRequirement('exterior_stations', 'ext'), severity: 'blocking' } as Requirement;
    const warning = newRequirement('processing_within', 'proc');
    const record = completeRecord({ processing: { confirmed: true, confirmedAt: '2026-12-03T00:00:00.000Z' } });
    const result = checkCaptureRecord(record, {
      client: { name: 'Northgate Mutual (invented)', requirements: [blocking, warning], facts: facts() },
    });
    expect(result.missing).toContainEqual({
      field: 'exteriorStations',
      message: expect.stringMatching(/^Required by Northgate Mutual \(invented\): Capture the exterior/),
    });
    expect(result.warnings.some((w) => w.field === 'processing.confirmed' && w.message.startsWith('Required by Northgate'))).toBe(true);
  });
  it('adds nothing for rules that pass or do not apply', () => {
    const result = checkCaptureRecord(completeRecord(), {
      client: { name: 'C', requirements: [newRequirement('exterior_stations', 'e')], facts: facts({ lossType: 'water' }) },
    });
    expect(result).toEqual(checkCaptureRecord(completeRecord()));
  });
});

describe('reading a programme from a request', () => {
  const valid = {
    rubricVersion: null,
    reviewHours: 12,
    reworkHours: 48,
    deliveryRelease: 'manual',
    requirements: [newRequirement('damage_photos', 'p')],
  };
  it('keeps a valid programme', () => {
    const { terms, problems } = readProgramme(valid, [1]);
    expect(problems).toEqual({});
    expect(terms).toMatchObject({
      reviewHours: 12,
      deliveryRelease: 'manual',
      requirements: [{ kind: 'damage_photos', params: { minPhotos: 2 } }],
    });
  });
  it('names each bad field, types as well as values', () => {
    const { problems } = readProgramme(
      {
        ...valid,
        rubricVersion: 9,
        reviewHours: ['12'],
        deliveryRelease: 'later',
        requirements: [
          { key: 'a', kind: 'damage_photos', severity: 'blocking', message: 'x', params: { minPhotos: 0 } },
          { key: 'a', kind: 'nope', severity: 'blocking', message: 'x', params: {} },
          { key: 'b', kind: 'exterior_stations', severity: 'loud', message: '', params: { lossTypes: 'wind', minStations: 2.5 } },
        ],
      },
      [1],
    );
    expect(Object.keys(problems).sort()).toEqual(
      [
        'rubricVersion',
        'reviewHours',
        'deliveryRelease',
        'requirements.0.params.minPhotos',
        'requirements.1.key',
        'requirements.1.kind',
        'requirements.2.severity',
        'requirements.2.message',
        'requirements.2.params.lossTypes',
        'requirements.2.params.minStations',
      ].sort(),
    );
  });
});
