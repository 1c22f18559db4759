// The facts of a record that the rework-risk model learns from. They describe the record only:
// never the technician's identity or history, so the hint is about the work, not the person.
import { type CameraClass, type CaptureRecord, roomAreaM2 } from './capture-record';
import type { LossType, PropertyType } from './jobs';
import type { StationAnalysis } from './station-analysis';
import { expectedStations, MAX_STATION_SPACING_M } from './station-spacing';

type FactDef = {
  key: string;
  // The fact as a row of the manager's odds-ratio table.
  label: string;
  // The fact in plain words for a value of it (only facts that raise the risk are named).
  words: (value: number) => string;
  // What would lower it; null where nothing on site changes it (the loss type, say).
  lower: string | null;
};

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

// The order is the model's: coefficient j + 1 belongs to fact j.
export const RISK_FACTS: FactDef[] = [
  {
    key: 'unflaggedReflective',
    label: 'Reflective surface found, not flagged (each)',
    words: (n) => `${plural(n, 'reflective surface')} found but not flagged`,
    lower: 'Flag every mirror and glass surface you found.',
  },
  {
    key: 'unresolvedGaps',
    label: 'Coverage gap not resolved (each)',
    words: (n) => `${plural(n, 'coverage gap')} not resolved`,
    lower: 'Resolve the gaps, or explain each one.',
  },
  {
    key: 'roomsShort',
    label: 'Room short of expected stations (each)',
    words: (n) => `${plural(n, 'room')} short of the expected stations`,
    lower: 'Add stations where rooms are short of the expected count.',
  },
  {
    key: 'noDoorwayStation',
    label: 'Room without a doorway station (each)',
    words: (n) => `${plural(n, 'room')} without a doorway station`,
    lower: 'Put a station in each doorway so both rooms are in view.',
  },
  {
    key: 'damageUnseen',
    label: 'Damage area with no station or photo (each)',
    words: (n) => `${plural(n, 'damage area')} with no viewing station or photo`,
    lower: 'Name a station or attach a photo for each damage area.',
  },
  {
    key: 'modelsSplit',
    label: 'Model split out (each)',
    words: (n) => `${plural(n, 'model')} split out`,
    lower: 'Link structures with stations where you can, so fewer models are split.',
  },
  {
    key: 'weakLinks',
    label: 'Weak link between stations (each)',
    words: (n) => `${plural(n, 'weak link')} between stations`,
    lower: 'Add a station where the chain between stations is long.',
  },
  {
    key: 'sparseStations',
    label: 'Station far from its neighbours (each)',
    words: (n) => `${plural(n, 'station')} far from its neighbours`,
    lower: 'Add stations between those far apart.',
  },
  {
    key: 'noStationFile',
    label: 'No station file attached',
    words: () => 'no station file attached',
    lower: "Attach the platform's station file.",
  },
  { key: 'resubmission', label: 'Each revision after the first', words: (n) => `revision ${n + 1}`, lower: null },
  { key: 'rooms', label: 'Each room', words: (n) => plural(n, 'room'), lower: null },
  { key: 'levels', label: 'Each level', words: (n) => plural(n, 'level'), lower: null },
  { key: 'camera360', label: '360 camera (against a tripod depth camera)', words: () => 'a 360 camera', lower: null },
  {
    key: 'cameraOther',
    label: 'Handheld or laser camera (against a tripod depth camera)',
    words: () => 'a handheld or laser camera',
    lower: null,
  },
  { key: 'lossFire', label: 'Fire or smoke loss (against water)', words: () => 'a fire or smoke loss', lower: null },
  { key: 'lossWindHail', label: 'Wind or hail loss (against water)', words: () => 'a wind or hail loss', lower: null },
  { key: 'notSingleFamily', label: 'Not a single-family house', words: () => 'not a single-family house', lower: null },
];

export type RiskJob = { lossType: LossType; propertyType: PropertyType };

function cameraFacts(cameraClass: CameraClass | null) {
  return {
    camera360: cameraClass === 'camera_360' ? 1 : 0,
    cameraOther: cameraClass === 'handheld_lidar' || cameraClass === 'laser_scanner' ? 1 : 0,
  };
}

export function riskFacts(record: CaptureRecord, analysis: StationAnalysis | null, job: RiskJob, revision: number): number[] {
  const spacing = record.cameraClass ? MAX_STATION_SPACING_M[record.cameraClass] : null;
  const roomsShort = record.rooms.filter((room) => {
    const area = roomAreaM2(room);
    return area !== null && spacing !== null && room.stations < expectedStations(area, spacing);
  }).length;
  const values: Record<string, number> = {
    unflaggedReflective: record.rooms.reduce((sum, r) => sum + r.reflective.reduce((s, x) => s + Math.max(0, x.found - x.flagged), 0), 0),
    unresolvedGaps: record.gaps.filter((g) => !g.resolved).length,
    roomsShort,
    noDoorwayStation: record.rooms.filter((r) => !r.doorwayStation).length,
    damageUnseen: record.damageAreas.filter((a) => a.stationNumbers.length === 0 && a.photoFileIds.length === 0).length,
    modelsSplit: record.models.filter((m) => m.splitReason !== null).length,
    weakLinks: analysis ? analysis.levels.reduce((s, l) => s + l.weakLinks.length, 0) : 0,
    sparseStations: analysis ? analysis.levels.reduce((s, l) => s + l.sparse.length, 0) : 0,
    noStationFile: analysis ? 0 : 1,
    resubmission: Math.max(0, revision - 1),
    rooms: record.rooms.length,
    levels: record.levels.length,
    ...cameraFacts(record.cameraClass),
    lossFire: job.lossType === 'fire' || job.lossType === 'smoke' ? 1 : 0,
    lossWindHail: job.lossType === 'wind' || job.lossType === 'hail' ? 1 : 0,
    notSingleFamily: job.propertyType === 'single_family' ? 0 : 1,
  };
  return RISK_FACTS.map((f) => values[f.key]);
}
