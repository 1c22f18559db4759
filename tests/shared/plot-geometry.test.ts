import { boundsOf, scaleBar, viewFor } from '../../shared/plot-geometry';

describe('plot geometry', () => {
  it('frames the stations with a margin', () => {
    expect(
      boundsOf(
        [
          { x: 0, y: 0 },
          { x: 4, y: 3 },
        ],
        1,
      ),
    ).toEqual({ x: -1, y: -1, width: 6, height: 5 });
  });

  it('zooms about the centre and pans by a share of the frame', () => {
    const base = { x: 0, y: 0, width: 10, height: 10 };
    expect(viewFor(base, 2, { x: 0, y: 0 })).toEqual({ x: 2.5, y: 2.5, width: 5, height: 5 });
    expect(viewFor(base, 1, { x: 0.1, y: 0 })).toEqual({ x: 1, y: 0, width: 10, height: 10 });
  });

  it("picks a round scale-bar length in the record's unit (1 ft = 0.3048 m)", () => {
    expect(scaleBar(2, 'm')).toEqual({ metres: 2, label: '2 m' });
    // 3 m is 9.84 ft: the largest round length under it is 5 ft = 1.524 m.
    expect(scaleBar(3, 'ft').label).toBe('5 ft');
    expect(scaleBar(3, 'ft').metres).toBeCloseTo(1.524, 12);
  });
});
