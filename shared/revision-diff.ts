// What changed between two revisions of a capture record, field by field, in the form's own
// words ("Kitchen · Stations in this room: 5 → 6"), so a reviewer reads only the difference.
// Lists of rooms, models, gaps, … are matched by their item key, not their position.
import { type CaptureRecord, REFLECTIVE_KINDS, type ReflectiveCount, type Room } from './capture-record';
import { damagePlaceName } from './damage-places';
import type { StoredFile } from './files';
import {
  areaText,
  DAMAGE_FIELD_LABELS,
  DETACHED_FIELD_LABELS,
  GAP_FIELD_LABELS,
  GROUP_FIELD_LABELS,
  labelled,
  lengthText,
  levelStationsLabel,
  MODEL_FIELD_LABELS,
  plainText,
  type RecordSection,
  reflectiveFlaggedLabel,
  reflectiveFoundLabel,
  ROOM_FIELD_LABELS,
  SCALAR_FIELDS,
  SECTION_LABELS,
  VALUE_LABELS,
  yesNo,
} from './record-labels';

export type Change = {
  // The record's top-level part (rooms, totalStations, …): what a criterion's carry-over reads.
  part: string;
  // The form section it sits in, for grouping on screen.
  section: RecordSection;
  // A stable machine path (item keys, not names), for React keys and tests.
  path: string;
  kind: 'added' | 'removed' | 'changed';
  // The field in the form's words, with the item it belongs to.
  label: string;
  before: string;
  after: string;
};

type Side = { record: CaptureRecord; files: Pick<StoredFile, 'id' | 'name'>[] };
type Ctx = { units: CaptureRecord['units']; fileName: (id: number) => string; before: CaptureRecord; after: CaptureRecord };

const EMPTY = '—';
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
const list = (items: string[]) => (items.length ? items.join(', ') : EMPTY);
const stations = (n: number) => `${n} station${n === 1 ? '' : 's'}`;

function roomName(record: CaptureRecord, key: string) {
  return record.rooms.find((r) => r.key === key)?.name.trim() || 'Room not named';
}

function modelName(record: CaptureRecord, key: string | null) {
  if (!key) return 'Not captured';
  const model = record.models.find((m) => m.key === key);
  if (!model) return 'Model not listed';
  return [labelled(VALUE_LABELS.structure, model.structure), model.platformReference].filter(Boolean).join(' · ');
}

type FieldFormat<T> = { [K in keyof T]?: (value: T[K], record: CaptureRecord, ctx: Ctx) => string };

const ROOM_FORMAT: FieldFormat<Room> = {
  level: (v) => labelled(VALUE_LABELS.level, v),
  lengthM: (v, _r, c) => lengthText(v, c.units),
  widthM: (v, _r, c) => lengthText(v, c.units),
  areaM2: (v, _r, c) => areaText(v, c.units),
  doorwayStation: yesNo,
};
const MODEL_FORMAT: FieldFormat<CaptureRecord['models'][number]> = {
  structure: (v) => labelled(VALUE_LABELS.structure, v),
  splitReason: (v) => (v ? labelled(VALUE_LABELS.splitReason, v) : 'Not split'),
};
const DETACHED_FORMAT: FieldFormat<CaptureRecord['detachedStructures'][number]> = {
  structure: (v) => labelled(VALUE_LABELS.structure, v),
  modelKey: (v, record) => modelName(record, v),
};
const GAP_FORMAT: FieldFormat<CaptureRecord['gaps'][number]> = {
  cause: (v) => labelled(VALUE_LABELS.cause, v),
  resolved: yesNo,
};
const DAMAGE_FORMAT: FieldFormat<CaptureRecord['damageAreas'][number]> = {
  roomKey: (v, record) => damagePlaceName(record, v),
  lossType: (v) => labelled(VALUE_LABELS.lossType, v),
  stationNumbers: (v) => list(v.map(String)),
  photoFileIds: (v, _r, c) => list(v.map(c.fileName)),
};

// How one item of a list is named, in the revision it comes from.
const ITEM_NAME = {
  rooms: (r: Room) => r.name.trim() || 'Room not named',
  models: (m: CaptureRecord['models'][number], record: CaptureRecord) => `Model: ${modelName(record, m.key)}`,
  detachedStructures: (s: CaptureRecord['detachedStructures'][number]) => s.name.trim() || 'Structure not named',
  gaps: (g: CaptureRecord['gaps'][number]) => `Gap at ${g.location.trim() || 'a place not named'}`,
  damageAreas: (d: CaptureRecord['damageAreas'][number], record: CaptureRecord) =>
    `${d.description.trim() || 'Damage'} (${damagePlaceName(record, d.roomKey)})`,
};

const ITEM_SUMMARY: Record<keyof typeof ITEM_NAME, (item: never, record: CaptureRecord) => string> = {
  rooms: (r: Room) => `${labelled(VALUE_LABELS.level, r.level)}, ${stations(r.stations)}`,
  models: (m: CaptureRecord['models'][number]) => (m.splitReason ? labelled(VALUE_LABELS.splitReason, m.splitReason) : 'Main capture'),
  detachedStructures: (s: CaptureRecord['detachedStructures'][number], record: CaptureRecord) => modelName(record, s.modelKey),
  gaps: (g: CaptureRecord['gaps'][number]) => labelled(VALUE_LABELS.cause, g.cause),
  damageAreas: (d: CaptureRecord['damageAreas'][number]) => labelled(VALUE_LABELS.lossType, d.lossType),
};

const LISTS = {
  rooms: { section: 'rooms', labels: ROOM_FIELD_LABELS, format: ROOM_FORMAT },
  models: { section: 'models', labels: MODEL_FIELD_LABELS, format: MODEL_FORMAT },
  detachedStructures: { section: 'detachedStructures', labels: DETACHED_FIELD_LABELS, format: DETACHED_FORMAT },
  gaps: { section: 'gaps', labels: GAP_FIELD_LABELS, format: GAP_FORMAT },
  damageAreas: { section: 'damageAreas', labels: DAMAGE_FIELD_LABELS, format: DAMAGE_FORMAT },
} as const;

function reflectiveChanges(
  name: string,
  path: string,
  before: ReflectiveCount[],
  after: ReflectiveCount[],
  push: (c: Omit<Change, 'part' | 'section'>) => void,
) {
  for (const kind of REFLECTIVE_KINDS) {
    const a = before.find((x) => x.kind === kind) ?? { found: 0, flagged: 0 };
    const b = after.find((x) => x.kind === kind) ?? { found: 0, flagged: 0 };
    if (a.found !== b.found)
      push({
        path: `${path}.${kind}.found`,
        kind: 'changed',
        label: `${name} · ${reflectiveFoundLabel(kind)}`,
        before: String(a.found),
        after: String(b.found),
      });
    if (a.flagged !== b.flagged)
      push({
        path: `${path}.${kind}.flagged`,
        kind: 'changed',
        label: `${name} · ${reflectiveFlaggedLabel(kind)}`,
        before: String(a.flagged),
        after: String(b.flagged),
      });
  }
}

function listChanges(part: keyof typeof LISTS, ctx: Ctx, changes: Change[]) {
  const { section, labels, format } = LISTS[part];
  const push = (c: Omit<Change, 'part' | 'section'>) => changes.push({ part, section, ...c });
  type Item = { key: string } & Record<string, unknown>;
  const name = (item: Item, record: CaptureRecord) => (ITEM_NAME[part] as (i: Item, r: CaptureRecord) => string)(item, record);
  const summary = (item: Item, record: CaptureRecord) => (ITEM_SUMMARY[part] as (i: Item, r: CaptureRecord) => string)(item, record);
  const before = new Map((ctx.before[part] as unknown as Item[]).map((item) => [item.key, item]));
  const after = new Map((ctx.after[part] as unknown as Item[]).map((item) => [item.key, item]));
  for (const [key, item] of after) {
    const old = before.get(key);
    const itemName = name(item, ctx.after);
    if (!old) {
      push({ path: `${part}.${key}`, kind: 'added', label: itemName, before: EMPTY, after: summary(item, ctx.after) });
      continue;
    }
    for (const field of Object.keys(labels)) {
      if (same(old[field], item[field])) continue;
      const show = (format as Record<string, ((v: unknown, r: CaptureRecord, c: Ctx) => string) | undefined>)[field];
      const text = (value: unknown, record: CaptureRecord) => (show ? show(value, record, ctx) : plainText(value));
      push({
        path: `${part}.${key}.${field}`,
        kind: 'changed',
        label: `${itemName} · ${(labels as Record<string, string>)[field]}`,
        before: text(old[field], ctx.before),
        after: text(item[field], ctx.after),
      });
    }
    if (part === 'rooms')
      reflectiveChanges(
        itemName,
        `${part}.${key}.reflective`,
        (old as unknown as Room).reflective,
        (item as unknown as Room).reflective,
        push,
      );
  }
  for (const [key, item] of before) {
    if (!after.has(key))
      push({ path: `${part}.${key}`, kind: 'removed', label: name(item, ctx.before), before: summary(item, ctx.before), after: EMPTY });
  }
}

const SCALAR_FORMAT: { [K in keyof typeof SCALAR_FIELDS]: (value: CaptureRecord[K]) => string } = {
  cameraClass: (v) => labelled(VALUE_LABELS.cameraClass, v),
  units: (v) => labelled(VALUE_LABELS.units, v),
  exteriorStations: plainText,
  totalStations: plainText,
  glazingFlagged: (v) => labelled(VALUE_LABELS.glazing, v),
  notes: plainText,
};

const timeText = (iso: string | null) => (iso ? `${iso.slice(0, 16).replace('T', ' ')} UTC` : EMPTY);

function groupChanges(ctx: Ctx, changes: Change[]) {
  const { before: p, after: n } = ctx;
  const push = (part: 'panoramas' | 'processing' | 'safety', field: string, before: string, after: string) =>
    changes.push({
      part,
      section: part,
      path: `${part}.${field}`,
      kind: 'changed',
      label: (GROUP_FIELD_LABELS[part] as Record<string, string>)[field],
      before,
      after,
    });
  if (p.panoramas.count !== n.panoramas.count) push('panoramas', 'count', String(p.panoramas.count), String(n.panoramas.count));
  if (!same(p.panoramas.roomKeys, n.panoramas.roomKeys))
    push(
      'panoramas',
      'roomKeys',
      list(p.panoramas.roomKeys.map((k) => roomName(p, k))),
      list(n.panoramas.roomKeys.map((k) => roomName(n, k))),
    );
  if (p.processing.confirmed !== n.processing.confirmed)
    push('processing', 'confirmed', yesNo(p.processing.confirmed), yesNo(n.processing.confirmed));
  if (p.processing.confirmedAt !== n.processing.confirmedAt)
    push('processing', 'confirmedAt', timeText(p.processing.confirmedAt), timeText(n.processing.confirmedAt));
  if (!same(p.safety.hazards, n.safety.hazards))
    push(
      'safety',
      'hazards',
      list(p.safety.hazards.map((h) => labelled(VALUE_LABELS.hazard, h))),
      list(n.safety.hazards.map((h) => labelled(VALUE_LABELS.hazard, h))),
    );
  if (p.safety.note !== n.safety.note) push('safety', 'note', plainText(p.safety.note), plainText(n.safety.note));
}

export function diffRevisions(previous: Side, next: Side): Change[] {
  const changes: Change[] = [];
  const names = new Map([...previous.files, ...next.files].map((f) => [f.id, f.name]));
  const ctx: Ctx = {
    units: next.record.units,
    fileName: (id) => names.get(id) ?? 'a file no longer attached',
    before: previous.record,
    after: next.record,
  };
  const p = previous.record;
  const n = next.record;

  for (const field of Object.keys(SCALAR_FIELDS) as (keyof typeof SCALAR_FIELDS)[]) {
    if (same(p[field], n[field])) continue;
    const format = SCALAR_FORMAT[field] as (v: unknown) => string;
    const { label, section } = SCALAR_FIELDS[field];
    changes.push({ part: field, section, path: field, kind: 'changed', label, before: format(p[field]), after: format(n[field]) });
  }

  const levels = (r: CaptureRecord) => new Map(r.levels.map((l) => [l.level, l.stations]));
  const [pl, nl] = [levels(p), levels(n)];
  for (const level of new Set([...pl.keys(), ...nl.keys()])) {
    const [a, b] = [pl.get(level), nl.get(level)];
    if (a === b) continue;
    changes.push({
      part: 'levels',
      section: 'levels',
      path: `levels.${level}`,
      kind: a === undefined ? 'added' : b === undefined ? 'removed' : 'changed',
      label: levelStationsLabel(level),
      before: a === undefined ? EMPTY : stations(a),
      after: b === undefined ? EMPTY : stations(b),
    });
  }

  for (const part of Object.keys(LISTS) as (keyof typeof LISTS)[]) listChanges(part, ctx, changes);
  groupChanges(ctx, changes);

  const beforeFiles = new Set(previous.files.map((f) => f.id));
  const afterFiles = new Set(next.files.map((f) => f.id));
  for (const file of next.files)
    if (!beforeFiles.has(file.id))
      changes.push({
        part: 'files',
        section: 'files',
        path: `files.${file.id}`,
        kind: 'added',
        label: 'File attached',
        before: EMPTY,
        after: file.name,
      });
  for (const file of previous.files)
    if (!afterFiles.has(file.id))
      changes.push({
        part: 'files',
        section: 'files',
        path: `files.${file.id}`,
        kind: 'removed',
        label: 'File removed',
        before: file.name,
        after: EMPTY,
      });

  return changes;
}

// The changes in form order, grouped under their section's heading.
export function groupChangesBySection(changes: Change[]): { section: RecordSection; title: string; changes: Change[] }[] {
  const order = Object.keys(SECTION_LABELS) as RecordSection[];
  return order
    .map((section) => ({ section, title: SECTION_LABELS[section], changes: changes.filter((c) => c.section === section) }))
    .filter((g) => g.changes.length > 0);
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
  const changed = new Set(changes.map((c) => c.part));
  return !inputs.some((section) => changed.has(section));
}
