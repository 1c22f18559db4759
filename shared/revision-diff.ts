// What changed between two revisions of a capture record, field by field, so a reviewer
// reads only the difference. Lists of rooms, models, gaps, … are matched by their item key.
import type { CaptureRecord } from './capture-record';
import type { StoredFile } from './files';

export type Change = { section: string; path: string; kind: 'added' | 'removed' | 'changed'; before: string; after: string };

type Side = { record: CaptureRecord; files: Pick<StoredFile, 'id' | 'name'>[] };

const KEYED_LISTS = ['rooms', 'models', 'detachedStructures', 'gaps', 'damageAreas'] as const;
const SCALARS = ['cameraClass', 'units', 'exteriorStations', 'totalStations', 'glazingFlagged', 'notes'] as const;

const show = (value: unknown): string => {
  if (value === null || value === undefined || value === '') return '—';
  if (Array.isArray(value)) return value.length ? value.map(show).join(', ') : '—';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
};

function label(item: Record<string, unknown>) {
  return String(item.name || item.location || item.description || item.platformReference || item.key);
}

function compareObjects(
  section: string,
  prefix: string,
  before: Record<string, unknown>,
  after: Record<string, unknown>,
  changes: Change[],
) {
  const fields = new Set([...Object.keys(before), ...Object.keys(after)]);
  for (const field of fields) {
    if (field === 'key') continue;
    const a = before[field];
    const b = after[field];
    if (JSON.stringify(a) !== JSON.stringify(b))
      changes.push({ section, path: `${prefix}.${field}`, kind: 'changed', before: show(a), after: show(b) });
  }
}

export function diffRevisions(previous: Side, next: Side): Change[] {
  const changes: Change[] = [];
  const p = previous.record;
  const n = next.record;

  for (const field of SCALARS) {
    if (JSON.stringify(p[field]) !== JSON.stringify(n[field]))
      changes.push({ section: field, path: field, kind: 'changed', before: show(p[field]), after: show(n[field]) });
  }

  const levels = (r: CaptureRecord) => Object.fromEntries(r.levels.map((l) => [l.level, l.stations]));
  const [pl, nl] = [levels(p), levels(n)];
  for (const level of new Set([...Object.keys(pl), ...Object.keys(nl)])) {
    if (!(level in pl))
      changes.push({ section: 'levels', path: `levels.${level}`, kind: 'added', before: '—', after: `${nl[level]} stations` });
    else if (!(level in nl))
      changes.push({ section: 'levels', path: `levels.${level}`, kind: 'removed', before: `${pl[level]} stations`, after: '—' });
    else if (pl[level] !== nl[level])
      changes.push({
        section: 'levels',
        path: `levels.${level}`,
        kind: 'changed',
        before: `${pl[level]} stations`,
        after: `${nl[level]} stations`,
      });
  }

  for (const list of KEYED_LISTS) {
    const before = new Map((p[list] as { key: string }[]).map((item) => [item.key, item as unknown as Record<string, unknown>]));
    const after = new Map((n[list] as { key: string }[]).map((item) => [item.key, item as unknown as Record<string, unknown>]));
    for (const [key, item] of after) {
      const old = before.get(key);
      if (!old) changes.push({ section: list, path: `${list}.${key}`, kind: 'added', before: '—', after: label(item) });
      else compareObjects(list, `${list}.${label(item)}`, old, item, changes);
    }
    for (const [key, item] of before) {
      if (!after.has(key)) changes.push({ section: list, path: `${list}.${key}`, kind: 'removed', before: label(item), after: '—' });
    }
  }

  for (const group of ['panoramas', 'processing', 'safety'] as const) {
    compareObjects(group, group, p[group] as Record<string, unknown>, n[group] as Record<string, unknown>, changes);
  }

  const beforeFiles = new Map(previous.files.map((f) => [f.id, f.name]));
  const afterFiles = new Map(next.files.map((f) => [f.id, f.name]));
  for (const [id, name] of afterFiles)
    if (!beforeFiles.has(id)) changes.push({ section: 'files', path: `files.${id}`, kind: 'added', before: '—', after: name });
  for (const [id, name] of beforeFiles)
    if (!afterFiles.has(id)) changes.push({ section: 'files', path: `files.${id}`, kind: 'removed', before: name, after: '—' });

  return changes;
}

// Which parts of the record each default criterion judges. A criterion whose parts did not
// change may start from its previous score (marked as carried over); others start empty.
export const CRITERION_INPUTS: Record<string, string[]> = {
  coverage: ['levels', 'rooms', 'exteriorStations', 'detachedStructures', 'files'],
  registration: ['totalStations', 'rooms', 'files'],
  spacing: ['rooms', 'cameraClass', 'files'],
  reflective: ['rooms', 'glazingFlagged'],
  damage: ['damageAreas', 'files'],
  supplementary: ['panoramas'],
  splits: ['models', 'detachedStructures'],
  lighting: ['gaps'],
  processing: ['processing'],
};

export function carriesOver(criterionKey: string, changes: Change[]): boolean {
  const inputs = CRITERION_INPUTS[criterionKey];
  if (!inputs) return false;
  const changed = new Set(changes.map((c) => c.section));
  return !inputs.some((section) => changed.has(section));
}
