// The record a visit plan fills in, and what the pre-submit checks say when the record lacks
// what the plan expected. Station estimates use the common-practice spacing (6 ft for a depth
// camera on a tripod; no published source).
import { emptyCaptureRecord } from '@/shared/capture-record';
import { isUntouchedRecord, planOrigin, planWarnings, recordFromPlan } from '@/shared/plan-record';
import { checkCaptureRecord } from '@/shared/pre-submit-checks';
import { feetToMetres } from '@/shared/units';
import { suggestedHazards } from '@/shared/visit-hazards';
import { emptyVisitPlan, type VisitPlan } from '@/shared/visit-plan';
import { suggestModels } from '@/shared/visit-suggestions';

function housePlan(): VisitPlan {
  const plan: VisitPlan = {
    ...emptyVisitPlan(),
    cameraClass: 'tripod_depth',
    conditions: { directSun: true, outdoorBlocked: false },
    structures: [
      { key: 'house', kind: 'main_dwelling', name: 'House', reachableInside: true, inScope: true, scopeNote: '' },
      { key: 'garage', kind: 'detached_garage', name: 'Garage', reachableInside: false, inScope: true, scopeNote: '' },
      { key: 'crawl', kind: 'crawl_space', name: 'Crawl space', reachableInside: false, inScope: true, scopeNote: '' },
      { key: 'shed', kind: 'shed', name: 'Garden shed', reachableInside: false, inScope: false, scopeNote: 'Adjuster: shed not damaged' },
    ],
    rooms: [
      { key: 'r1', name: 'Kitchen', level: 'ground', lengthM: feetToMetres(12), widthM: feetToMetres(15) },
      { key: 'r2', name: 'Hall', level: 'ground', lengthM: feetToMetres(10), widthM: feetToMetres(10) },
    ],
    hazards: ['standing_water', 'crawl_space_entry'],
  };
  return { ...plan, models: suggestModels(plan), modelsAccepted: true, startLevel: 'ground' };
}

describe('record from plan', () => {
  it('fills camera, models with split reasons, structures, levels, rooms with expected stations, and hazards', () => {
    const record = recordFromPlan(housePlan());
    expect(record.cameraClass).toBe('tripod_depth');
    expect(record.models.map((m) => [m.structure, m.splitReason])).toEqual([
      ['main_dwelling', null],
      ['detached_garage', 'daylight'],
      ['crawl_space', 'daylight'],
    ]);
    expect(record.detachedStructures).toEqual([
      expect.objectContaining({ key: 'garage', name: 'Garage', modelKey: 'model-garage', noModelReason: '' }),
      expect.objectContaining({ key: 'shed', modelKey: null, noModelReason: "Not in the claim's scope: Adjuster: shed not damaged" }),
    ]);
    // 180 ft² → 5 stations; 100 ft² → 3 (at 6 ft spacing).
    expect(record.rooms.map((r) => [r.name, r.stations])).toEqual([
      ['Kitchen', 5],
      ['Hall', 3],
    ]);
    expect(record.levels).toEqual([
      { level: 'crawl_space', stations: 0 },
      { level: 'ground', stations: 8 },
    ]);
    expect(record.safety.hazards).toEqual(['standing_water', 'crawl_space_entry']);
    expect(isUntouchedRecord(emptyCaptureRecord())).toBe(true);
    expect(isUntouchedRecord(record)).toBe(false);
  });

  it('knows which values still hold what the plan put there', () => {
    const plan = housePlan();
    const record = recordFromPlan(plan);
    record.rooms[0].stations = 6;
    record.models[1].splitReason = 'other';
    const origin = planOrigin(record, plan);
    expect(origin.rooms.r1).toEqual({ name: true, size: true, stations: false });
    expect(origin.rooms.r2).toEqual({ name: true, size: true, stations: true });
    expect([...origin.models]).toEqual(['model-house', 'model-crawl']);
  });
});

describe('plan against result (warnings at pre-submit)', () => {
  it('is silent when the record holds what the plan expected', () => {
    expect(planWarnings(recordFromPlan(housePlan()), housePlan())).toEqual([]);
  });

  it('warns of a structure planned but neither captured nor explained, a missing model and a missing room', () => {
    const plan = housePlan();
    const record = recordFromPlan(plan);
    record.models = record.models.filter((m) => m.key !== 'model-garage');
    record.rooms = record.rooms.filter((r) => r.name !== 'Hall');
    record.levels = record.levels.filter((l) => l.level !== 'crawl_space');
    const messages = planWarnings(record, plan).map((f) => f.message);
    expect(messages).toEqual([
      'Planned: Garage. It is neither captured in a model nor explained.',
      'Planned: Crawl space. It is not among the levels captured, and no coverage gap explains it.',
      'Planned model missing: Garage.',
      'Planned room missing: Hall.',
    ]);
    // The same warnings come through the pre-submit checks, and block nothing.
    const checks = checkCaptureRecord(record, { plan });
    expect(checks.warnings.map((w) => w.message)).toEqual(expect.arrayContaining(messages));
    expect(checks.missing.some((m) => m.message.startsWith('Planned'))).toBe(false);
  });

  it('accepts a reason instead of a capture', () => {
    const plan = housePlan();
    const record = recordFromPlan(plan);
    record.detachedStructures[0] = { ...record.detachedStructures[0], modelKey: null, noModelReason: 'Locked; owner away' };
    record.models = record.models.filter((m) => m.key !== 'model-garage');
    expect(planWarnings(record, plan).map((f) => f.message)).toEqual(['Planned model missing: Garage.']);
  });
});

describe('hazards for the loss', () => {
  it('suggests water hazards for a water loss, and attic and crawl-space entry when they are in scope', () => {
    expect(suggestedHazards('water', housePlan().structures)).toEqual(['standing_water', 'live_wiring', 'mould', 'crawl_space_entry']);
    expect(suggestedHazards('fire', [{ kind: 'attic', inScope: true }])).toEqual([
      'fire_structure',
      'soot',
      'live_wiring',
      'unsafe_attic_decking',
    ]);
    expect(suggestedHazards('hail', [])).toEqual(['roof_access', 'ladders']);
  });
});
