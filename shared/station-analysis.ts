// Station-layout analysis: reads the capture itself, level by level.
//  - nearest neighbour of each registered station (Delaunay neighbours, via d3-delaunay:
//    a point's nearest neighbour is always one of its Delaunay neighbours);
//  - stations whose nearest neighbour is farther than the camera class's maximum spacing;
//  - the registration chain: each station's link to the nearest EARLIER station in capture
//    order; a long link is where registration tends to fail (weak link);
//  - stations per area for each room of the capture record;
//  - the Clark–Evans aggregation index R over the level's area, with its z-score
//    (Clark & Evans 1954, Ecology 35:445–453).
// Supplementary panoramas are not registered, so they are counted but left out of all checks.
import { Delaunay } from 'd3-delaunay';
import { quadtree } from 'd3-quadtree';

import { LEVEL_KINDS, type LevelKind } from './capture-record';
import type { StationPoint } from './station-file';
import { expectedStations } from './station-spacing';

export type NearestNeighbour = { station: number; neighbour: number | null; distance: number | null };
export type ChainLink = { station: number; from: number | null; distance: number | null; weak: boolean };
export type RoomDensity = {
  room: string;
  stations: number;
  areaM2: number | null;
  perTenSquareMetres: number | null;
  expected: number | null;
  short: boolean;
};
export type ClarkEvans = {
  n: number;
  areaM2: number;
  observedMean: number;
  expectedMean: number;
  standardError: number;
  r: number;
  z: number;
};

export type LevelAnalysis = {
  level: LevelKind;
  stations: StationPoint[];
  registered: number;
  panoramas: number;
  nearest: NearestNeighbour[];
  spacing: { mean: number | null; median: number | null; max: number | null };
  sparse: number[];
  chain: ChainLink[];
  weakLinks: ChainLink[];
  rooms: RoomDensity[];
  clarkEvans: ClarkEvans | null;
  // The maximum spacing this level was judged by (outdoor for the exterior). Absent in
  // analyses stored before it existed: read it with levelMaxSpacing.
  maxSpacingM?: number | null;
};

export const levelMaxSpacing = (analysis: StationAnalysis, level: LevelAnalysis) =>
  level.maxSpacingM !== undefined ? level.maxSpacingM : analysis.maxSpacingM;

export type StationAnalysis = { maxSpacingM: number | null; levels: LevelAnalysis[] };

export type AnalysisOptions = {
  maxSpacingM: number | null;
  // For the exterior level; the indoor maximum when not given.
  outdoorMaxSpacingM?: number | null;
  rooms?: { name: string; areaM2: number | null }[];
  // Overrides the area used for Clark–Evans (m²); by default the level's bounding box grown
  // by half the mean nearest-neighbour distance on every side, so each station counts its share.
  areaM2?: number;
};

const distance = (a: StationPoint, b: StationPoint) => Math.hypot(a.x - b.x, a.y - b.y);

export function nearestNeighbours(points: StationPoint[]): NearestNeighbour[] {
  if (points.length < 2) return points.map((p) => ({ station: p.number, neighbour: null, distance: null }));
  if (points.length === 2) {
    const d = distance(points[0], points[1]);
    return [
      { station: points[0].number, neighbour: points[1].number, distance: d },
      { station: points[1].number, neighbour: points[0].number, distance: d },
    ];
  }
  // Stations at one spot (a file of repeated rows) are each other's nearest neighbours at
  // distance 0; the triangulation is built over distinct spots only, so the work stays
  // O(n log n) whatever the input (d3-delaunay orders collinear spots along their line).
  const spots = new Map<string, number[]>();
  points.forEach((p, i) => {
    const key = `${p.x},${p.y}`;
    const at = spots.get(key);
    if (at) at.push(i);
    else spots.set(key, [i]);
  });
  const groups = [...spots.values()];
  const unique = groups.map((g) => points[g[0]]);
  const nearestSpot: { spot: number; d: number }[] = unique.map(() => ({ spot: -1, d: Infinity }));
  if (unique.length === 2) {
    const d = distance(unique[0], unique[1]);
    nearestSpot[0] = { spot: 1, d };
    nearestSpot[1] = { spot: 0, d };
  } else if (unique.length > 2) {
    const delaunay = Delaunay.from(
      unique,
      (p) => p.x,
      (p) => p.y,
    );
    unique.forEach((p, i) => {
      for (const j of delaunay.neighbors(i)) {
        const d = distance(p, unique[j]);
        if (d < nearestSpot[i].d) nearestSpot[i] = { spot: j, d };
      }
    });
  }
  const result: NearestNeighbour[] = new Array(points.length);
  groups.forEach((group, s) => {
    group.forEach((i, k) => {
      if (group.length > 1) result[i] = { station: points[i].number, neighbour: points[group[k === 0 ? 1 : 0]].number, distance: 0 };
      else {
        const near = nearestSpot[s];
        result[i] = {
          station: points[i].number,
          neighbour: near.spot < 0 ? null : points[groups[near.spot][0]].number,
          distance: near.spot < 0 ? null : near.d,
        };
      }
    });
  });
  return result;
}

// Nearest earlier station for each station in capture order: stations go into a quadtree
// (d3-quadtree) one by one, and each is first looked up against those already in it, so a
// query costs about log n whatever the layout (a pile of repeated rows, a line, a cluster
// with a far outlier).
export function registrationChain(points: StationPoint[], maxSpacingM: number | null): ChainLink[] {
  const ordered = [...points].sort((a, b) => a.number - b.number);
  const tree = quadtree<StationPoint>()
    .x((p) => p.x)
    .y((p) => p.y);
  // The tree holds each spot once: a repeated spot's nearest earlier station is the first one
  // there, at distance 0 (a quadtree keeps duplicates in a list it would walk every time).
  const firstAt = new Map<string, StationPoint>();
  return ordered.map((p) => {
    const spot = `${p.x},${p.y}`;
    const same = firstAt.get(spot);
    let from: StationPoint | null = same ?? null;
    if (!same) {
      // (tree.size() walks the whole tree, so emptiness is told by the spots seen so far.)
      from = firstAt.size ? (tree.find(p.x, p.y) ?? null) : null;
      tree.add(p);
      firstAt.set(spot, p);
    }
    const d = from ? distance(p, from) : null;
    return {
      station: p.number,
      from: from ? from.number : null,
      distance: d,
      weak: d !== null && maxSpacingM !== null && d > maxSpacingM + 1e-9,
    };
  });
}

export function clarkEvans(observedMean: number, n: number, areaM2: number): ClarkEvans {
  const density = n / areaM2;
  const expectedMean = 0.5 / Math.sqrt(density);
  const standardError = 0.26136 / Math.sqrt(n * density);
  return {
    n,
    areaM2,
    observedMean,
    expectedMean,
    standardError,
    r: observedMean / expectedMean,
    z: (observedMean - expectedMean) / standardError,
  };
}

const median = (values: number[]) => {
  const s = [...values].sort((a, b) => a - b);
  return s.length ? (s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2) : null;
};

export function analyseLevel(level: LevelKind, all: StationPoint[], options: AnalysisOptions): LevelAnalysis {
  const registered = all.filter((s) => s.kind === 'station');
  const nearest = nearestNeighbours(registered);
  const distances = nearest.map((n) => n.distance).filter((d): d is number => d !== null);
  const mean = distances.length ? distances.reduce((s, d) => s + d, 0) / distances.length : null;
  const max = level === 'exterior' && options.outdoorMaxSpacingM !== undefined ? options.outdoorMaxSpacingM : options.maxSpacingM;
  const chain = registrationChain(registered, max);

  let ce: ClarkEvans | null = null;
  if (registered.length >= 3 && mean !== null) {
    const xs = registered.map((s) => s.x);
    const ys = registered.map((s) => s.y);
    const grow = mean / 2;
    const area = options.areaM2 ?? (Math.max(...xs) - Math.min(...xs) + 2 * grow) * (Math.max(...ys) - Math.min(...ys) + 2 * grow);
    if (area > 0) ce = clarkEvans(mean, registered.length, area);
  }

  const roomNames = [...new Set(registered.map((s) => s.room).filter((r): r is string => Boolean(r)))];
  const rooms = roomNames.map((name) => {
    const count = registered.filter((s) => s.room === name).length;
    const areaM2 = options.rooms?.find((r) => r.name.trim().toLowerCase() === name.trim().toLowerCase())?.areaM2 ?? null;
    const expected = areaM2 !== null && max !== null ? expectedStations(areaM2, max) : null;
    return {
      room: name,
      stations: count,
      areaM2,
      perTenSquareMetres: areaM2 ? (count / areaM2) * 10 : null,
      expected,
      short: expected !== null && count < expected,
    };
  });

  return {
    level,
    stations: all,
    registered: registered.length,
    panoramas: all.length - registered.length,
    nearest,
    spacing: { mean, median: median(distances), max: distances.length ? Math.max(...distances) : null },
    sparse: max === null ? [] : nearest.filter((n) => n.distance !== null && n.distance > max + 1e-9).map((n) => n.station),
    chain,
    weakLinks: chain.filter((c) => c.weak),
    rooms,
    clarkEvans: ce,
    maxSpacingM: max,
  };
}

export function analyseStations(stations: StationPoint[], options: AnalysisOptions): StationAnalysis {
  const levels = LEVEL_KINDS.filter((level) => stations.some((s) => s.level === level));
  return {
    maxSpacingM: options.maxSpacingM,
    levels: levels.map((level) =>
      analyseLevel(
        level,
        stations.filter((s) => s.level === level),
        options,
      ),
    ),
  };
}

// Findings offered to the reviewer as starting comments; nothing is scored automatically.
export function suggestedComments(
  analysis: StationAnalysis,
  unit: 'ft' | 'm',
  levelLabel: (l: LevelKind) => string,
): Record<'spacing' | 'registration', string[]> {
  const show = (m: number) => (unit === 'm' ? `${m.toFixed(1)} m` : `${(m / 0.3048).toFixed(1)} ft`);
  const spacing: string[] = [];
  const registration: string[] = [];
  for (const level of analysis.levels) {
    const name = levelLabel(level.level);
    const max = levelMaxSpacing(analysis, level);
    if (level.sparse.length && max !== null && max !== undefined) {
      spacing.push(
        `${name}: station${level.sparse.length > 1 ? 's' : ''} ${level.sparse.map((n) => `#${n}`).join(', ')} ${level.sparse.length > 1 ? 'are' : 'is'} more than ${show(max)} from the nearest station.`,
      );
    }
    for (const room of level.rooms.filter((r) => r.short)) {
      spacing.push(`${name}, ${room.room}: ${room.stations} station(s) where about ${room.expected} are expected for its area.`);
    }
    for (const link of level.weakLinks) {
      registration.push(
        `${name}: station #${link.station} is ${show(link.distance!)} from the nearest earlier station (#${link.from}); check that it registered in the right place.`,
      );
    }
  }
  return { spacing, registration };
}
