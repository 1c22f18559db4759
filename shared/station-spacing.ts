// Recommended maximum distance between neighbouring stations, by camera class.
// Common practice of the trade, no published source: about 5–6 ft indoors for a tripod depth
// camera and 4–5 ft for a 360 camera, closer in cluttered rooms; we take the upper end as the
// maximum. Laser scanners reach much further (about 10 m, from memory). Handheld lidar records
// a continuous path, not stations, so no spacing rule applies.
import type { CameraClass } from './capture-record';
import { feetToMetres } from './units';

export const MAX_STATION_SPACING_M: Record<CameraClass, number | null> = {
  tripod_depth: feetToMetres(6),
  camera_360: feetToMetres(5),
  handheld_lidar: null,
  laser_scanner: 10,
};

// Outdoors, around the walls and across the yard, stations sit further apart: nothing blocks
// the view and the surfaces are large. From memory, common practice (no published source):
// about 10 ft for a tripod depth camera or a 360 camera, 15 m for a laser scanner. A setting,
// so a firm can change it; without it every exterior station was flagged as too far apart.
export const MAX_OUTDOOR_STATION_SPACING_M: Record<CameraClass, number | null> = {
  tripod_depth: feetToMetres(10),
  camera_360: feetToMetres(10),
  handheld_lidar: null,
  laser_scanner: 15,
};

// ceil(area / spacing²), at least one station per room. The small tolerance keeps an exact
// multiple (e.g. 180 ft² at 6 ft: 5 stations) from rounding up through float error.
export function expectedStations(areaM2: number, spacingM: number): number {
  const raw = areaM2 / (spacingM * spacingM);
  return Math.max(1, Math.ceil(raw - 1e-9));
}
