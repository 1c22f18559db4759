import fc from 'fast-check';
import { median } from 'simple-statistics';

import { medianOfCounts } from '../../shared/statistics';
import { weekSpan } from '../../shared/trends';

describe('medianOfCounts', () => {
  // Reference: simple-statistics' median of the expanded values (a general-purpose library).
  it('equals the median of the expanded values', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ value: fc.integer({ min: -500, max: 5000 }), n: fc.integer({ min: 0, max: 6 }) }), { maxLength: 30 }),
        (counts) => {
          const expanded = counts.flatMap((c) => Array<number>(c.n).fill(c.value));
          expect(medianOfCounts(counts)).toBe(expanded.length ? median(expanded) : null);
        },
      ),
    );
  });

  it('averages the two middle values of an even count, as MariaDB MEDIAN does', () => {
    // Worked: 2, 4, 4, 10 -> (4 + 4) / 2 = 4; 1, 2, 3, 10 -> (2 + 3) / 2 = 2.5.
    expect(
      medianOfCounts([
        { value: 4, n: 2 },
        { value: 2, n: 1 },
        { value: 10, n: 1 },
      ]),
    ).toBe(4);
    expect(medianOfCounts([1, 2, 3, 10].map((value) => ({ value, n: 1 })))).toBe(2.5);
  });
});

describe('weekSpan', () => {
  // 2026-11-30 is a Monday and 2026-12-06 the Sunday after it (calendar).
  it('widens a period to whole Monday-to-Sunday weeks', () => {
    expect(weekSpan('2026-12-02', '2026-12-02')).toEqual({
      fromWeek: '2026-11-30',
      toWeek: '2026-11-30',
      from: '2026-11-30',
      to: '2026-12-06',
    });
    expect(weekSpan('2026-11-30', '2026-12-13')).toMatchObject({ fromWeek: '2026-11-30', toWeek: '2026-12-07', to: '2026-12-13' });
    expect(weekSpan('2026-12-06', '2026-12-07')).toMatchObject({ fromWeek: '2026-11-30', toWeek: '2026-12-07' });
  });
});
