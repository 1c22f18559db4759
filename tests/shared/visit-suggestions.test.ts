// The visit plan's suggestions. Spacing values are common practice of the trade (no published
// source): about 6 ft between stations for a tripod depth camera, 5 ft for a 360 camera. Unit
// conversions are exact (NIST SP 811, 1 ft = 0.3048 m). Times per station are Sightline's
// defaults, from memory, checked here only for the arithmetic.
import fc from 'fast-check';

import { CAMERA_CLASSES } from '@/shared/capture-record';
import { feetToMetres } from '@/shared/units';
import { PLAN_STRUCTURE_KINDS, type PlannedRoom, type PlannedStructure } from '@/shared/visit-plan';
import { DEFAULT_CAMERA_CLASS_SETTINGS, unTickedKit } from '@/shared/visit-settings';
import {
  minutesOnSite,
  modelCoverage,
  outdoorStations,
  roomEstimates,
  suggestInScope,
  suggestModels,
  suggestStartLevel,
  SUN_LIMITED,
  timeOnSiteText,
  visitEstimate,
} from '@/shared/visit-suggestions';

const structure = (key: string, kind: PlannedStructure['kind'], reachableInside: boolean, inScope = true): PlannedStructure => ({
  key,
  kind,
  name: '',
  reachableInside,
  inScope,
  scopeNote: '',
});
const room = (key: string, lengthFt: number, widthFt: number, level: PlannedRoom['level'] = 'ground'): PlannedRoom => ({
  key,
  name: key,
  level,
  lengthM: feetToMetres(lengthFt),
  widthM: feetToMetres(widthFt),
});
const sunny = { directSun: true, outdoorBlocked: false };
const overcast = { directSun: false, outdoorBlocked: false };

describe('outdoor stations', () => {
  it('marks the tripod depth camera, and only it, as losing surfaces in direct sun (common practice)', () => {
    expect(SUN_LIMITED).toEqual({ tripod_depth: true, camera_360: false, handheld_lidar: false, laser_scanner: false });
    expect(outdoorStations('tripod_depth', sunny)).toMatchObject({ possible: false, reason: 'daylight' });
    expect(outdoorStations('tripod_depth', sunny).explanation).toMatch(/common practice/);
    expect(outdoorStations('camera_360', sunny)).toMatchObject({ possible: true });
    expect(outdoorStations('laser_scanner', sunny)).toMatchObject({ possible: true });
    expect(outdoorStations('tripod_depth', overcast)).toMatchObject({ possible: true });
  });

  it('rules outdoor stations out when the site does, whatever the camera', () => {
    expect(outdoorStations('laser_scanner', { directSun: false, outdoorBlocked: true })).toMatchObject({
      possible: false,
      reason: 'no_access',
    });
  });
});

describe('model split suggestion', () => {
  it('gives one model when every structure in scope is reached from inside', () => {
    const models = suggestModels({
      structures: [
        structure('house', 'main_dwelling', true),
        structure('garage', 'detached_garage', true),
        structure('attic', 'attic', true),
      ],
      cameraClass: 'tripod_depth',
      conditions: sunny,
    });
    expect(models).toHaveLength(1);
    expect(models[0]).toMatchObject({ structure: 'main_dwelling', structureKeys: ['house', 'garage', 'attic'], splitReason: null });
  });

  it('splits a detached structure out when it has no inside access and outdoor stations are not possible, with the reason', () => {
    const models = suggestModels({
      structures: [structure('house', 'main_dwelling', true), structure('garage', 'detached_garage', false)],
      cameraClass: 'tripod_depth',
      conditions: sunny,
    });
    expect(models).toHaveLength(2);
    expect(models[1]).toMatchObject({ structure: 'detached_garage', structureKeys: ['garage'], splitReason: 'daylight' });
    expect(models[1].splitNote).toMatch(/Detached garage: no access from inside/);
  });

  it('keeps one model when outdoor stations can link the detached structure', () => {
    const structures = [structure('house', 'main_dwelling', true), structure('garage', 'detached_garage', false)];
    expect(suggestModels({ structures, cameraClass: 'tripod_depth', conditions: overcast })).toHaveLength(1);
    expect(suggestModels({ structures, cameraClass: 'camera_360', conditions: sunny })).toHaveLength(1);
  });

  it('gives three models for a house, a detached garage and a crawl space entered from outside, depth camera in sun', () => {
    const models = suggestModels({
      structures: [
        structure('house', 'main_dwelling', true),
        structure('garage', 'detached_garage', false),
        structure('crawl', 'crawl_space', false),
      ],
      cameraClass: 'tripod_depth',
      conditions: sunny,
    });
    expect(models.map((m) => [m.structure, m.splitReason])).toEqual([
      ['main_dwelling', null],
      ['detached_garage', 'daylight'],
      ['crawl_space', 'daylight'],
    ]);
  });

  it('leaves out-of-scope structures out of every model, and anchors on the first in scope without a dwelling', () => {
    const models = suggestModels({
      structures: [structure('house', 'main_dwelling', true, false), structure('shed', 'shed', false)],
      cameraClass: 'tripod_depth',
      conditions: sunny,
    });
    expect(models).toEqual([expect.objectContaining({ structure: 'shed', structureKeys: ['shed'], splitReason: null })]);
  });

  it('covers every in-scope structure exactly once, and no other, for any property (property test)', () => {
    const structures = fc.uniqueArray(
      fc.record({
        key: fc.stringMatching(/^[a-z]{1,6}$/),
        kind: fc.constantFrom(...PLAN_STRUCTURE_KINDS),
        name: fc.constant(''),
        reachableInside: fc.boolean(),
        inScope: fc.boolean(),
        scopeNote: fc.constant(''),
      }),
      { selector: (s) => s.key, maxLength: 8 },
    );
    fc.assert(
      fc.property(
        structures,
        fc.constantFrom(null, ...CAMERA_CLASSES),
        fc.record({ directSun: fc.boolean(), outdoorBlocked: fc.boolean() }),
        (list, cameraClass, conditions) => {
          const models = suggestModels({ structures: list, cameraClass, conditions });
          const covered = models.flatMap((m) => m.structureKeys).sort();
          expect(covered).toEqual(
            list
              .filter((s) => s.inScope)
              .map((s) => s.key)
              .sort(),
          );
          expect(modelCoverage({ structures: list, models })).toEqual({ uncovered: [], twice: [] });
          models.slice(1).forEach((m) => expect(m.splitReason).not.toBeNull());
        },
      ),
    );
  });

  it('names structures a changed model set leaves out, or holds twice', () => {
    const structures = [structure('house', 'main_dwelling', true), structure('garage', 'detached_garage', false)];
    const models = suggestModels({ structures, cameraClass: 'tripod_depth', conditions: sunny });
    expect(modelCoverage({ structures, models: models.slice(0, 1) }).uncovered.map((s) => s.key)).toEqual(['garage']);
    const twice = [models[0], { ...models[1], structureKeys: ['garage', 'house'] }];
    expect(modelCoverage({ structures, models: twice }).twice.map((s) => s.key)).toEqual(['house']);
  });
});

describe('start level (common practice: the lowest level in scope)', () => {
  const base = { cameraClass: 'tripod_depth' as const, conditions: sunny };
  it('starts in the basement of a house with a basement, ground and upper floor', () => {
    const rooms = [room('Bedroom', 10, 10, 'upper'), room('Kitchen', 12, 12), room('Rec room', 20, 15, 'basement')];
    expect(suggestStartLevel({ ...base, structures: [structure('house', 'main_dwelling', true)], rooms })).toBe('basement');
  });
  it('starts on the ground floor when the crawl space is entered from outside (its own model)', () => {
    const structures = [structure('house', 'main_dwelling', true), structure('crawl', 'crawl_space', false)];
    expect(suggestStartLevel({ ...base, structures, rooms: [room('Kitchen', 12, 12)] })).toBe('ground');
  });
  it('starts in the crawl space when its hatch is inside the house', () => {
    const structures = [structure('house', 'main_dwelling', true), structure('crawl', 'crawl_space', true)];
    expect(suggestStartLevel({ ...base, structures, rooms: [room('Kitchen', 12, 12)] })).toBe('crawl_space');
  });
  it('has no start before there are rooms or levels', () => {
    expect(suggestStartLevel({ ...base, structures: [structure('house', 'main_dwelling', true)], rooms: [] })).toBeNull();
  });
});

describe('station and time estimates (worked values)', () => {
  it('expects ceil(area / spacing²) stations per room', () => {
    // 12 × 15 ft = 180 ft²; at 6 ft: 180 / 36 = 5 exactly; at 5 ft: 180 / 25 = 7.2 → 8.
    expect(roomEstimates([room('Living', 12, 15)], 'tripod_depth')[0].stations).toBe(5);
    expect(roomEstimates([room('Living', 12, 15)], 'camera_360')[0].stations).toBe(8);
    // Handheld lidar walks a path: no station estimate.
    expect(roomEstimates([room('Living', 12, 15)], 'handheld_lidar')[0].stations).toBeNull();
  });

  it('adds the set-up time to the stations times the time per station', () => {
    // 180 ft² → 5; 100 ft² → 100/36 = 2.8 → 3; 224 ft² → 6.2 → 7; 80 ft² → 2.2 → 3. Total 18.
    const rooms = [room('Living', 12, 15), room('Bed', 10, 10), room('Kitchen', 14, 16), room('Bath', 8, 10)];
    const estimate = visitEstimate({ rooms, cameraClass: 'tripod_depth' }, DEFAULT_CAMERA_CLASS_SETTINGS.tripod_depth);
    expect(estimate.rooms.map((r) => r.stations)).toEqual([5, 3, 7, 3]);
    expect(estimate.stations).toBe(18);
    // 20 min set-up + 18 × 1.5 min = 47 min.
    expect(estimate.minutes).toBe(47);
  });

  it('counts rooms without a size, and makes no time estimate without a per-station time', () => {
    const rooms = [room('Living', 12, 15), { ...room('Hall', 1, 1), lengthM: null }];
    const estimate = visitEstimate({ rooms, cameraClass: 'handheld_lidar' }, DEFAULT_CAMERA_CLASS_SETTINGS.handheld_lidar);
    expect(estimate).toMatchObject({ stations: 0, unsized: 2, minutes: null });
    expect(visitEstimate({ rooms, cameraClass: 'tripod_depth' }, null).unsized).toBe(1);
  });

  it('measures the time on site from arrival to leaving', () => {
    expect(minutesOnSite({ arrivedAt: '2026-11-03T09:05:00Z', leftAt: '2026-11-03T10:20:30Z' })).toBe(76);
    expect(minutesOnSite({ arrivedAt: '2026-11-03T09:05:00Z', leftAt: null })).toBeNull();
    expect(minutesOnSite({ arrivedAt: '2026-11-03T11:00:00Z', leftAt: '2026-11-03T10:00:00Z' })).toBeNull();
  });

  it('lists the kit items not ticked yet, in order', () => {
    expect(unTickedKit(['Tripod', 'Batteries', 'Wedges'], ['Wedges', 'Tripod'])).toEqual(['Batteries']);
  });
});

describe('scope suggestion', () => {
  it('puts the dwelling, attic and crawl space in scope, and detached structures for losses that reach them', () => {
    expect(suggestInScope('attic', 'water')).toBe(true);
    expect(suggestInScope('detached_garage', 'water')).toBe(false);
    expect(suggestInScope('detached_garage', 'hail')).toBe(true);
    expect(suggestInScope('shed', 'smoke')).toBe(false);
  });
});

describe('planned against actual time on site', () => {
  it('sums the visits and gives the share over or under the plan', () => {
    // 130 planned, 160 actual: (160 − 130) / 130 = 23.1 % over.
    expect(timeOnSiteText({ timed: 3, plannedMinutes: 130, actualMinutes: 160 })).toBe(
      '3 visits: planned 2 h 10 min, actual 2 h 40 min (+23 % over)',
    );
    expect(timeOnSiteText({ timed: 1, plannedMinutes: 60, actualMinutes: 45 })).toBe('1 visit: planned 1 h, actual 45 min (−25 % under)');
    expect(timeOnSiteText({ timed: 0, plannedMinutes: 0, actualMinutes: 0 })).toBe('No timed visits');
  });
});
