// Per camera class: the kit a technician packs and the time a visit takes. A manager keeps
// them; these are the defaults until one does.
import type { CameraClass } from './capture-record';

export type CameraClassSettings = {
  cameraClass: CameraClass;
  kitItems: string[];
  // Minutes per station, moving the tripod included; null where the camera takes no stations.
  minutesPerStation: number | null;
  // Walk-through, photos, set-up and packing up, whatever the size of the house.
  setupMinutes: number;
};

export const SETTINGS_LIMITS = { minutesPerStation: 30, setupMinutes: 240 } as const;

const COMMON_KIT = ['Door wedges', 'Painter’s tape for marking stations', 'Phone or tablet charger', 'Torch with spare batteries'];

// Times from memory, not measured: a depth camera on a tripod takes about a minute a
// station plus the move; a 360 camera less; a laser scanner several minutes. Handheld lidar
// walks a path and has no stations, so only the set-up time applies and no estimate is made.
export const DEFAULT_CAMERA_CLASS_SETTINGS: Record<CameraClass, CameraClassSettings> = {
  tripod_depth: {
    cameraClass: 'tripod_depth',
    kitItems: [
      'Tripod with a level head for the depth camera',
      'Camera battery charged, and a spare',
      'External battery and its cable',
      ...COMMON_KIT,
    ],
    minutesPerStation: 1.5,
    setupMinutes: 20,
  },
  camera_360: {
    cameraClass: 'camera_360',
    kitItems: ['Light tripod or monopod for the 360 camera', 'Camera battery charged, and a spare', 'Lens cloth', ...COMMON_KIT],
    minutesPerStation: 1,
    setupMinutes: 15,
  },
  handheld_lidar: {
    cameraClass: 'handheld_lidar',
    kitItems: ['Scanner charged, and a spare battery', 'Carry case', ...COMMON_KIT],
    minutesPerStation: null,
    setupMinutes: 20,
  },
  laser_scanner: {
    cameraClass: 'laser_scanner',
    kitItems: [
      'Survey tripod for the scanner',
      'Scanner batteries charged, and spares',
      'Targets or spheres if the firm uses them',
      ...COMMON_KIT,
    ],
    minutesPerStation: 4,
    setupMinutes: 25,
  },
};

// Items of the kit not ticked yet, in the list's order.
export function unTickedKit(kitItems: string[], ticked: string[]): string[] {
  const done = new Set(ticked);
  return kitItems.filter((item) => !done.has(item));
}
