import { carriesOver, diffRevisions, groupChangesBySection } from '../../shared/revision-diff';
import { feetToMetres } from '../../shared/units';
import { completeRecord, room } from '../helpers/records';

const side = (record = completeRecord(), files: { id: number; name: string }[] = []) => ({ record, files });
const words = (changes: ReturnType<typeof diffRevisions>) => changes.map((c) => [c.label, c.before, c.after]);

describe('diffRevisions', () => {
  it('finds nothing between identical revisions', () => {
    expect(diffRevisions(side(), side())).toEqual([]);
  });

  it("names a changed station count with the form's labels, never the stored field names", () => {
    const before = completeRecord();
    const after = completeRecord({
      totalStations: 6,
      levels: [{ level: 'ground', stations: 6 }],
      rooms: [{ ...before.rooms[0], stations: 6 }],
    });
    const changes = diffRevisions(side(before), side(after));
    expect(words(changes)).toEqual([
      ['Total stations in the capture', '5', '6'],
      ['Stations on ground floor', '5 stations', '6 stations'],
      ['Kitchen · Stations in this room', '5', '6'],
    ]);
    expect(changes.map((c) => c.part)).toEqual(['totalStations', 'levels', 'rooms']);
    expect(changes.map((c) => c.section)).toEqual(['stations', 'levels', 'rooms']);
  });

  it('reads a reflective surface flagged since the last revision per kind, not as stored JSON', () => {
    const bathroom = room({ key: 'r2', name: 'Bathroom', reflective: [{ kind: 'mirror', found: 1, flagged: 0 }] });
    const changes = diffRevisions(
      side(completeRecord({ rooms: [bathroom] })),
      side(completeRecord({ rooms: [{ ...bathroom, reflective: [{ kind: 'mirror', found: 1, flagged: 1 }] }] })),
    );
    expect(words(changes)).toEqual([['Bathroom · Mirror flagged', '0', '1']]);
    expect(changes.flatMap((c) => [c.label, c.before, c.after]).join(' ')).not.toMatch(/[{}]/);
  });

  it("shows sizes in the record's own units and yes/no in words", () => {
    const kitchen = room({ lengthM: feetToMetres(12), widthM: feetToMetres(15), doorwayStation: false });
    const changes = diffRevisions(
      side(completeRecord({ rooms: [kitchen] })),
      side(completeRecord({ rooms: [{ ...kitchen, lengthM: feetToMetres(13), doorwayStation: true }] })),
    );
    expect(words(changes)).toEqual([
      ['Kitchen · Length', '12 ft', '13 ft'],
      ['Kitchen · Station in the doorway (sees both rooms)', 'No', 'Yes'],
    ]);
  });

  it('reports rooms added and removed by their key, and files attached by name', () => {
    const before = completeRecord();
    const after = completeRecord({ rooms: [room({ key: 'r9', name: 'Attic', level: 'attic', stations: 5 })] });
    const changes = diffRevisions(
      side(before, [{ id: 1, name: 'a.png' }]),
      side(after, [
        { id: 1, name: 'a.png' },
        { id: 7, name: 'attic.png' },
      ]),
    );
    expect(changes.map((c) => [c.kind, c.label, c.before, c.after])).toEqual([
      ['added', 'Attic', '—', 'Attic, 5 stations'],
      ['removed', 'Kitchen', 'Ground floor, 5 stations', '—'],
      ['added', 'File attached', '—', 'attic.png'],
    ]);
    expect(changes.map((c) => c.path)).toEqual(['rooms.r9', 'rooms.r1', 'files.7']);
  });

  it("names a damage area's photos by file name and its place by room name", () => {
    const area = {
      key: 'd1',
      roomKey: 'r1',
      description: 'Ceiling stain',
      lossType: 'water' as const,
      stationNumbers: [2],
      photoFileIds: [],
    };
    const files = [{ id: 7, name: 'ceiling.jpg' }];
    const changes = diffRevisions(
      side(completeRecord({ damageAreas: [area] }), files),
      side(completeRecord({ damageAreas: [{ ...area, roomKey: '@roof', photoFileIds: [7] }] }), files),
    );
    expect(words(changes)).toEqual([
      ['Ceiling stain (Roof) · Where', 'Kitchen', 'Roof'],
      ['Ceiling stain (Roof) · Photos', '—', 'ceiling.jpg'],
    ]);
  });

  it('reports a resolved coverage gap', () => {
    const gap = { key: 'g1', location: 'Sunroom', cause: 'direct_sun' as const, resolved: false, note: '' };
    const changes = diffRevisions(
      side(completeRecord({ gaps: [gap] })),
      side(completeRecord({ gaps: [{ ...gap, resolved: true, note: 'Recaptured at dusk' }] })),
    );
    expect(words(changes)).toEqual([
      ['Gap at Sunroom · Resolved with extra stations later', 'No', 'Yes'],
      ['Gap at Sunroom · Note', '—', 'Recaptured at dusk'],
    ]);
  });

  it("groups changes under the form's sections, in form order", () => {
    const changes = diffRevisions(
      side(completeRecord()),
      side(completeRecord({ notes: 'See the porch', cameraClass: 'camera_360', safety: { hazards: ['live_wiring'], note: '' } })),
    );
    expect(groupChangesBySection(changes).map((g) => [g.title, g.changes.map((c) => `${c.before} → ${c.after}`)])).toEqual([
      ['Camera and units', ['Depth camera on tripod → 360 camera']],
      ['Safety', ['— → Live wiring']],
      ['Notes', ['— → See the porch']],
    ]);
  });
});

describe('carriesOver', () => {
  it("carries a score over only when none of the criterion's inputs changed", () => {
    const changes = diffRevisions(
      side(),
      side(completeRecord({ gaps: [{ key: 'g1', location: 'Porch', cause: 'direct_sun', resolved: true, note: '' }] })),
    );
    expect(carriesOver('processing', changes)).toBe(true);
    expect(carriesOver('lighting', changes)).toBe(false);
    expect(carriesOver('record_accuracy', changes)).toBe(false);
  });
});
