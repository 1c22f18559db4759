// The server names fields of the stored record (rooms.0.lengthM, levels.1.stations); the form
// names its own (rooms.0.length, levels.ground.stations). These map one onto the other, and
// take a refused value out of a record so that the rest can still be saved.
import type { CaptureRecord } from '@/shared/capture-record';

const RENAMED: [RegExp, string][] = [
  [/^rooms\.(\d+)\.lengthM$/, 'rooms.$1.length'],
  [/^rooms\.(\d+)\.widthM$/, 'rooms.$1.width'],
  [/^rooms\.(\d+)\.areaM2$/, 'rooms.$1.area'],
  [/^damageAreas\.(\d+)\.stationNumbers\.\d+$/, 'damageAreas.$1.stationNumbers'],
];

export function formFieldFor(path: string, record: CaptureRecord): string {
  const level = /^levels\.(\d+)\.stations$/.exec(path);
  if (level) return `levels.${record.levels[Number(level[1])]?.level ?? 'ground'}.stations`;
  const reflective = /^rooms\.(\d+)\.reflective\.(\d+)\.(found|flagged)$/.exec(path);
  if (reflective) {
    const kind = record.rooms[Number(reflective[1])]?.reflective[Number(reflective[2])]?.kind ?? 'other';
    return `rooms.${reflective[1]}.reflective.${kind}.${reflective[3]}`;
  }
  for (const [pattern, replacement] of RENAMED) if (pattern.test(path)) return path.replace(pattern, replacement);
  return path;
}

export function toFormFields(fields: Record<string, string>, record: CaptureRecord): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([path, message]) => [formFieldFor(path, record), message]));
}

const NULLABLE_NUMBERS = /(^|\.)(lengthM|widthM|areaM2|totalStations)$/;

// Replaces each refused leaf with an empty value (text → '', optional number → null, count → 0).
// Returns null when a refused path is not a plain leaf: then nothing is guessed.
export function withoutRefused(record: CaptureRecord, paths: string[]): CaptureRecord | null {
  const copy = structuredClone(record) as unknown as Record<string, unknown>;
  for (const path of paths) {
    const parts = path.split('.');
    const leaf = parts.pop()!;
    let parent: unknown = copy;
    for (const part of parts) parent = (parent as Record<string, unknown> | undefined)?.[part];
    if (!parent || typeof parent !== 'object') return null;
    const holder = parent as Record<string, unknown>;
    const value = holder[leaf];
    if (typeof value === 'string') holder[leaf] = '';
    else if (typeof value === 'number') holder[leaf] = NULLABLE_NUMBERS.test(path) ? null : 0;
    else return null;
  }
  return copy as unknown as CaptureRecord;
}
