import { DEFAULT_RUBRIC } from '../../shared/default-rubric';

describe('default rubric', () => {
  it('has weights that sum to 100 and unique keys', () => {
    expect(DEFAULT_RUBRIC.criteria.reduce((s, c) => s + c.weight, 0)).toBe(100);
    expect(new Set(DEFAULT_RUBRIC.criteria.map((c) => c.key)).size).toBe(DEFAULT_RUBRIC.criteria.length);
  });

  it('marks coverage, registration, damage and processing as critical', () => {
    expect(DEFAULT_RUBRIC.criteria.filter((c) => c.critical).map((c) => c.key)).toEqual([
      'coverage',
      'registration',
      'damage',
      'processing',
    ]);
  });
});
