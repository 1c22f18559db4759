import { carriesOver, diffRevisions } from '../../shared/revision-diff';
import { completeRecord, room } from '../helpers/records';

const side = (record = completeRecord(), files: { id: number; name: string }[] = []) => ({ record, files });

describe('diffRevisions', () => {
  it('finds nothing between identical revisions', () => {
    expect(diffRevisions(side(), side())).toEqual([]);
  });

  it('reports a changed station count on a room and the new total', () => {
    const before = completeRecord();
    const after = completeRecord({
      totalStations: 6,
      levels: [{ level: 'ground', stations: 6 }],
      rooms: [{ ...before.rooms[0], stations: 6 }],
    });
    expect(diffRevisions(side(before), side(after))).toEqual([
      { section: 'totalStations', path: 'totalStations', kind: 'changed', before: '5', after: '6' },
      { section: 'levels', path: 'levels.ground', kind: 'changed', before: '5 stations', after: '6 stations' },
      { section: 'rooms', path: 'rooms.Kitchen.stations', kind: 'changed', before: '5', after: '6' },
    ]);
  });

  it('reports rooms added and removed by their key, and files added', () => {
    const before = completeRecord();
    const after = completeRecord({ rooms: [room({ key: 'r9', name: 'Attic', level: 'attic', stations: 5 })] });
    const changes = diffRevisions(
      side(before, [{ id: 1, name: 'a.png' }]),
      side(after, [
        { id: 1, name: 'a.png' },
        { id: 2, name: 'attic.png' },
      ]),
    );
    expect(changes).toEqual([
      { section: 'rooms', path: 'rooms.r9', kind: 'added', before: '—', after: 'Attic' },
      { section: 'rooms', path: 'rooms.r1', kind: 'removed', before: 'Kitchen', after: '—' },
      { section: 'files', path: 'files.2', kind: 'added', before: '—', after: 'attic.png' },
    ]);
  });

  it('reports a resolved coverage gap', () => {
    const gap = { key: 'g1', location: 'Sunroom', cause: 'direct_sun' as const, resolved: false, note: '' };
    const changes = diffRevisions(
      side(completeRecord({ gaps: [gap] })),
      side(completeRecord({ gaps: [{ ...gap, resolved: true, note: 'Recaptured at dusk' }] })),
    );
    expect(changes.map((c) => [c.path, c.before, c.after])).toEqual([
      ['gaps.Sunroom.resolved', 'false', 'true'],
      ['gaps.Sunroom.note', '—', 'Recaptured at dusk'],
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
