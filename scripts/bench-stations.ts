// Benchmark: station-layout analysis of 10,000 stations on one level, against a naive
// all-pairs version computed in the same run. Run with: npm run bench:stations
import { performance } from 'node:perf_hooks';

import { analyseLevel, type ChainLink, type NearestNeighbour } from '../shared/station-analysis';
import type { StationPoint } from '../shared/station-file';
import { MAX_STATION_SPACING_M } from '../shared/station-spacing';

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

function time<T>(label: string, runs: number, work: () => T): { ms: number; result: T } {
  let result = work(); // warm-up
  const start = performance.now();
  for (let i = 0; i < runs; i++) result = work();
  const ms = (performance.now() - start) / runs;
  console.log(`${label.padEnd(34)} ${ms.toFixed(1).padStart(9)} ms`);
  return { ms, result };
}

const points = layout(N);
const max = MAX_STATION_SPACING_M.tripod_depth!;
console.log(`Station-layout analysis, ${N} stations on one level (Node ${process.version})`);
const fast = time('Delaunay + grid (Sightline)', 5, () => analyseLevel('ground', points, { maxSpacingM: max }));
const slow = time('Naive all-pairs', 1, () => naive(points, max));

// Same answers, or the comparison means nothing.
const mismatch =
  fast.result.nearest.findIndex((n, i) => Math.abs(n.distance! - slow.result.nearest[i].distance!) > 1e-9) +
  fast.result.chain.findIndex((c, i) => (c.distance ?? -1) !== (slow.result.chain[i].distance ?? -1)) +
  2;
if (mismatch !== 0) throw new Error('The two versions disagree');
console.log(`Speed-up: ${(slow.ms / fast.ms).toFixed(0)}× (results identical)`);
