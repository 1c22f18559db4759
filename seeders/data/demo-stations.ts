// Invented station layouts for a few demo jobs, drawn from their capture records: each room's
// stations on a small grid, a doorway station between rooms where the record says there is
// one, and the exterior walked around the outside. Coordinates in feet.
import type { CaptureRecord } from '../../shared/capture-record';
import { metresToFeet } from '../../shared/units';
import { seededRandom } from './demo-jobs';

export function demoStationCsv(record: CaptureRecord, seed: number): string {
  const rand = seededRandom(seed);
  const rows: string[] = ['station,level,x,y,unit,room,kind'];
  let number = 0;
  const add = (level: string, xM: number, yM: number, room: string, kind = 'station') => {
    number += 1;
    rows.push(`${number},${level},${metresToFeet(xM).toFixed(2)},${metresToFeet(yM).toFixed(2)},ft,${room},${kind}`);
  };
  const offsets = new Map<string, number>();
  for (const room of record.rooms) {
    const length = room.lengthM ?? 3;
    const width = room.widthM ?? 3;
    const start = offsets.get(room.level) ?? 0;
    offsets.set(room.level, start + length + 0.3);
    if (start > 0 && room.doorwayStation) add(room.level, start - 0.15, width / 2, room.name);
    const inRoom = Math.max(1, room.stations - (start > 0 && room.doorwayStation ? 1 : 0));
    const cols = Math.max(1, Math.round(Math.sqrt((inRoom * length) / width)));
    const lines = Math.ceil(inRoom / cols);
    for (let k = 0; k < inRoom; k++) {
      const c = k % cols;
      const r = Math.floor(k / cols);
      const jitter = () => (rand() - 0.5) * 0.3;
      add(room.level, start + ((c + 0.5) * length) / cols + jitter(), ((r + 0.5) * width) / lines + jitter(), room.name);
    }
  }
  const span = Math.max(...[...offsets.values()], 6);
  for (let k = 0; k < record.exteriorStations; k++) {
    const t = k / record.exteriorStations;
    add('exterior', -2 + t * (span + 4), t < 0.5 ? -2 : 10, 'Exterior');
  }
  if (record.panoramas.count > 0) add(record.rooms[0]?.level ?? 'ground', 1, 1, record.rooms[0]?.name ?? '', 'panorama');
  return `${rows.join('\n')}\n`;
}
