import {
  analyseLevel,
  analyseStations,
  clarkEvans,
  nearestNeighbours,
  registrationChain,
  suggestedComments,
} from '../../shared/station-analysis';
import type { StationPoint } from '../../shared/station-file';
import { MAX_STATION_SPACING_M } from '../../shared/station-spacing';

const at = (number: number, x: number, y: number, extra: Partial<StationPoint> = {}): StationPoint => ({
  number,
  level: 'ground',
  x,
  y,
  room: null,
  kind: 'station',
  ...extra,
});
// Common practice, no published source: about 6 ft (1.8288 m) for a tripod depth camera.
const TRIPOD = MAX_STATION_SPACING_M.tripod_depth!;

describe('nearest neighbours and the registration chain (worked by hand)', () => {
  it('3-4-5 right triangle', () => {
    const pts = [at(1, 0, 0), at(2, 3, 0), at(3, 0, 4)];
    expect(nearestNeighbours(pts)).toEqual([
      { station: 1, neighbour: 2, distance: 3 },
      { station: 2, neighbour: 1, distance: 3 },
      { station: 3, neighbour: 1, distance: 4 },
    ]);
    // Station 3's earlier stations: #1 at 4 m, #2 at 5 m (the hypotenuse) → links to #1.
    expect(registrationChain(pts, null).map((c) => [c.station, c.from, c.distance])).toEqual([
      [1, null, null],
      [2, 1, 3],
      [3, 1, 4],
    ]);
  });

  it('a regular 4 × 4 grid at 1.5 m: every nearest neighbour is 1.5 m and nothing is sparse', () => {
    const pts = Array.from({ length: 16 }, (_, i) => at(i + 1, (i % 4) * 1.5, Math.floor(i / 4) * 1.5));
    const level = analyseLevel('ground', pts, { maxSpacingM: TRIPOD });
    expect(level.nearest.every((n) => Math.abs(n.distance! - 1.5) < 1e-12)).toBe(true);
    expect(level.spacing).toEqual({ mean: 1.5, median: 1.5, max: 1.5 });
    expect(level.sparse).toEqual([]);
    expect(level.weakLinks).toEqual([]);
  });

  it('finds the one deliberate 4 m jump as the only weak link', () => {
    // Stations 1–5 every 1.5 m along a hall, then #6 4 m past #5, then #7 1.5 m on.
    const pts = [0, 1.5, 3, 4.5, 6, 10, 11.5].map((x, i) => at(i + 1, x, 0));
    const level = analyseLevel('ground', pts, { maxSpacingM: TRIPOD });
    expect(level.weakLinks.map((l) => [l.station, l.from, l.distance])).toEqual([[6, 5, 4]]);
    // #6's nearest neighbour overall is #7 (1.5 m), so it is not sparse: only the order is weak.
    expect(level.sparse).toEqual([]);
  });

  it('uses the later station when the earlier ones are all far', () => {
    const chain = registrationChain([at(1, 0, 0), at(2, 20, 0), at(3, 1, 0)], TRIPOD);
    expect(chain.map((c) => [c.station, c.from, c.weak])).toEqual([
      [1, null, false],
      [2, 1, true],
      [3, 1, false],
    ]);
  });
});

describe('Clark–Evans aggregation index', () => {
  it('matches the worked case: 3 × 3 grid at 2 m on 6 m × 6 m', () => {
    // Clark & Evans (1954) Ecology 35:445–453: r_E = 0.5/√ρ, SE = 0.26136/√(Nρ), R = r_A/r_E, z = (r_A − r_E)/SE.
    // ρ = 9/36 = 0.25 → r_E = 1.0, SE = 0.26136/1.5 = 0.17424, R = 2/1 = 2.0, z = 1/0.17424 = 5.7392.
    const ce = clarkEvans(2, 9, 36);
    expect(ce.expectedMean).toBeCloseTo(1, 12);
    expect(ce.standardError).toBeCloseTo(0.17424, 5);
    expect(ce.r).toBeCloseTo(2, 12);
    expect(ce.z).toBeCloseTo(5.7392, 4);
  });

  it('gets the same figures from the stations themselves (area: bounding box grown by half the mean spacing)', () => {
    const pts = Array.from({ length: 9 }, (_, i) => at(i + 1, (i % 3) * 2, Math.floor(i / 3) * 2));
    const level = analyseLevel('ground', pts, { maxSpacingM: TRIPOD });
    expect(level.clarkEvans!.areaM2).toBeCloseTo(36, 12);
    expect(level.clarkEvans!.r).toBeCloseTo(2, 12);
    expect(level.clarkEvans!.z).toBeCloseTo(5.7392, 4);
  });
});

describe('analyseStations', () => {
  it('leaves panoramas out of every check but counts them', () => {
    const pts = [at(1, 0, 0), at(2, 1.5, 0), at(3, 40, 40, { kind: 'panorama' })];
    const [level] = analyseStations(pts, { maxSpacingM: TRIPOD }).levels;
    expect(level.registered).toBe(2);
    expect(level.panoramas).toBe(1);
    expect(level.sparse).toEqual([]);
  });

  it('judges exterior stations by the outdoor spacing, indoor ones by the indoor spacing', () => {
    // Stations 8 ft (2.4384 m) apart: too far indoors for a tripod depth camera (6 ft, common
    // practice), within the outdoor 10 ft (from memory, common practice).
    const eight = 8 * 0.3048;
    const indoor = [0, eight, 2 * eight].map((x, i) => at(i + 1, x, 0));
    const outdoor = [0, eight, 2 * eight].map((x, i) => at(i + 4, x, 0, { level: 'exterior' }));
    const analysis = analyseStations([...indoor, ...outdoor], { maxSpacingM: TRIPOD, outdoorMaxSpacingM: 10 * 0.3048 });
    const [ground, exterior] = analysis.levels;
    expect(ground.sparse).toEqual([1, 2, 3]);
    expect(exterior.sparse).toEqual([]);
    expect(exterior.weakLinks).toEqual([]);
    expect(exterior.maxSpacingM).toBeCloseTo(3.048, 6);
    const suggestions = suggestedComments(analysis, 'ft', (l) => (l === 'exterior' ? 'Exterior' : 'Ground floor'));
    expect(suggestions.spacing.some((s) => s.startsWith('Exterior'))).toBe(false);
  });

  it('splits levels and flags rooms with fewer stations than their area suggests', () => {
    const pts = [at(1, 0, 0, { room: 'Kitchen' }), at(2, 1.5, 0, { room: 'Kitchen' }), at(3, 0, 0, { level: 'upper', room: 'Bedroom' })];
    // Kitchen 16.72 m² (180 ft²) at 1.8288 m spacing: 5 expected (common practice), 2 present.
    const analysis = analyseStations(pts, { maxSpacingM: TRIPOD, rooms: [{ name: 'kitchen', areaM2: 16.7225472 }] });
    expect(analysis.levels.map((l) => l.level)).toEqual(['ground', 'upper']);
    expect(analysis.levels[0].rooms).toEqual([
      { room: 'Kitchen', stations: 2, areaM2: 16.7225472, perTenSquareMetres: (2 / 16.7225472) * 10, expected: 5, short: true },
    ]);
    const suggestions = suggestedComments(analysis, 'ft', (l) => (l === 'ground' ? 'Ground floor' : 'Upper floor'));
    expect(suggestions.spacing).toEqual(['Ground floor, Kitchen: 2 station(s) where about 5 are expected for its area.']);
  });

  it("words the weak links for the reviewer in the record's unit", () => {
    const pts = [0, 1.5, 5.5].map((x, i) => at(i + 1, x, 0));
    const suggestions = suggestedComments(analyseStations(pts, { maxSpacingM: TRIPOD }), 'ft', () => 'Ground floor');
    // 4 m = 13.1 ft (÷ 0.3048, NIST SP 811).
    expect(suggestions.registration).toEqual([
      'Ground floor: station #3 is 13.1 ft from the nearest earlier station (#2); check that it registered in the right place.',
    ]);
    expect(suggestions.spacing).toEqual(['Ground floor: station #3 is more than 6.0 ft from the nearest station.']);
  });
});
