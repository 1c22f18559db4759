// Pure helpers for drawing a station plan: bounds with a margin, zoomed and panned view boxes,
// and a scale bar of a round length in the record's unit.
import type { LengthUnit } from './units';
import { METRES_PER_FOOT } from './units';

export type ViewBox = { x: number; y: number; width: number; height: number };

export function boundsOf(points: { x: number; y: number }[], marginM = 1): ViewBox {
  if (points.length === 0) return { x: 0, y: 0, width: 10, height: 10 };
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const minX = Math.min(...xs) - marginM;
  const minY = Math.min(...ys) - marginM;
  return { x: minX, y: minY, width: Math.max(Math.max(...xs) + marginM - minX, 2), height: Math.max(Math.max(...ys) + marginM - minY, 2) };
}

// zoom > 1 shows less; pan moves the centre by a share of the visible width/height.
export function viewFor(base: ViewBox, zoom: number, pan: { x: number; y: number }): ViewBox {
  const width = base.width / zoom;
  const height = base.height / zoom;
  const cx = base.x + base.width / 2 + pan.x * base.width;
  const cy = base.y + base.height / 2 + pan.y * base.height;
  return { x: cx - width / 2, y: cy - height / 2, width, height };
}

const NICE = [0.5, 1, 2, 5, 10, 20, 50, 100, 200];

// The largest round length (in the display unit) no longer than `targetM` metres.
export function scaleBar(targetM: number, unit: LengthUnit): { metres: number; label: string } {
  const perUnit = unit === 'm' ? 1 : METRES_PER_FOOT;
  const target = targetM / perUnit;
  const length = [...NICE].reverse().find((n) => n <= target) ?? NICE[0];
  return { metres: length * perUnit, label: `${length} ${unit}` };
}
