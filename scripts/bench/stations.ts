// Station-layout analysis of 10,000 stations on one level: a realistic jittered grid, and the
// worst cases (all coincident, all on one line, an exact grid), beside a naive all-pairs
// version computed in the same run. Part of npm run bench; alone: npm run bench:stations.
import { performance } from 'node:perf_hooks';

import { analyseLevel, type ChainLink, type NearestNeighbour } from '../../shared/station-analysis';
import type { StationPoint } from '../../shared/station-file';
import { MAX_STATION_SPACING_M } from '../../shared/station-spacing';

const N = Number(process.env.STATIONS ?? 10_000);

// Seeded jittered grid at about 1.5 m, the density of a real capture, walked in rows.
function layout(n: number): StationPoint[] {
  let seed = 42;
  const rand = () => (seed = (seed * 1664525 + 1013904223) >>> 0) / 2 ** 32;
  const side = Math.ceil(Math.sqrt(n));
  return Array.from({ length: n }, (_, i) => ({
    number: i + 1,
    level: 'ground' as const,
    room: null,
    kind: 'station' as const,
    x: (i % side) * 1.5 + (rand() - 0.5) * 0.6,
    y: Math.floor(i / side) * 1.5 + (rand() - 0.5) * 0.6,
  }));
}

function naive(points: StationPoint[], max: number) {
  const nearest: NearestNeighbour[] = points.map((p, i) => {
    let best = -1;
    let bestD = Infinity;
    points.forEach((q, j) => {
      if (j !== i) {
        const d = Math.hypot(p.x - q.x, p.y - q.y);
        if (d < bestD) {
          bestD = d;
          best = j;
        }
      }
    });
    return { station: p.number, neighbour: points[best].number, distance: bestD };
  });
  const chain: ChainLink[] = points.map((p, i) => {
    let best = -1;
    let bestD = Infinity;
    for (let j = 0; j < i; j++) {
      const d = Math.hypot(p.x - points[j].x, p.y - points[j].y);
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    }
    return {
      station: p.number,
      from: best < 0 ? null : points[best].number,
      distance: best < 0 ? null : bestD,
      weak: best >= 0 && bestD > max,
    };
  });
  return { nearest, chain };
}

function time<T>(runs: number, work: () => T): { ms: number; result: T } {
  let result = work(); // warm-up
  const start = performance.now();
  for (let i = 0; i < runs; i++) result = work();
  return { ms: (performance.now() - start) / runs, result };
}

const station = (i: number, x: number, y: number): StationPoint => ({ number: i + 1, level: 'ground', room: null, kind: 'station', x, y });
const WORST_CASES: Record<string, (n: number) => StationPoint[]> = {
  'all at one point': (n) => Array.from({ length: n }, (_, i) => station(i, 3, 4)),
  'all on one line': (n) => Array.from({ length: n }, (_, i) => station(i, i * 1.5, i * 0.75)),
  'exact 1.5 m grid': (n) => {
    const side = Math.ceil(Math.sqrt(n));
    return Array.from({ length: n }, (_, i) => station(i, (i % side) * 1.5, Math.floor(i / side) * 1.5));
  },
};

export type StationFigures = { layouts: { layout: string; stations: number; ms: number }[]; naiveMs: number };

export function benchStations(n = N): StationFigures {
  const max = MAX_STATION_SPACING_M.tripod_depth!;
  const points = layout(n);
  const fast = time(5, () => analyseLevel('ground', points, { maxSpacingM: max }));
  const slow = time(1, () => naive(points, max));
  // Same answers, or the comparison means nothing.
  const mismatch =
    fast.result.nearest.findIndex((nn, i) => Math.abs(nn.distance! - slow.result.nearest[i].distance!) > 1e-9) +
    fast.result.chain.findIndex((c, i) => (c.distance ?? -1) !== (slow.result.chain[i].distance ?? -1)) +
    2;
  if (mismatch !== 0) throw new Error('The two versions disagree');
  const layouts = [{ layout: 'jittered grid (realistic)', stations: n, ms: fast.ms }];
  for (const [name, make] of Object.entries(WORST_CASES)) {
    const pts = make(n);
    layouts.push({ layout: name, stations: n, ms: time(3, () => analyseLevel('ground', pts, { maxSpacingM: max })).ms });
  }
  return { layouts, naiveMs: slow.ms };
}

if (require.main === module) {
  console.log(`Station-layout analysis, ${N} stations on one level (Node ${process.version})`);
  const figures = benchStations();
  for (const l of figures.layouts) console.log(`${l.layout.padEnd(30)} ${l.ms.toFixed(1).padStart(9)} ms`);
  console.log(`${'naive all-pairs'.padEnd(30)} ${figures.naiveMs.toFixed(1).padStart(9)} ms (same answers)`);
}
