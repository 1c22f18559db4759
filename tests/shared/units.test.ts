import { feetToMetres, METRES_PER_FOOT, metresToFeet, SQUARE_METRES_PER_SQUARE_FOOT, squareFeetToSquareMetres } from '../../shared/units';

// Source: NIST SP 811 (2008) App. B.8 and 24 FR 5348 (1959): the international foot is
// exactly 0.3048 m and 1 ft² is exactly 0.09290304 m².
describe('unit conversion', () => {
  it('uses the international foot, exactly 0.3048 m', () => {
    expect(METRES_PER_FOOT).toBe(0.3048);
    expect(feetToMetres(1)).toBe(0.3048);
    expect(feetToMetres(10)).toBeCloseTo(3.048, 12);
  });

  it('converts square feet with 0.09290304 m² per ft²', () => {
    expect(SQUARE_METRES_PER_SQUARE_FOOT).toBeCloseTo(0.09290304, 15);
    expect(squareFeetToSquareMetres(100)).toBeCloseTo(9.290304, 12);
  });

  it('is not the US survey foot (1200/3937 m, deprecated since 2023, 85 FR 62698)', () => {
    const surveyFoot = 1200 / 3937;
    expect(feetToMetres(1)).not.toBeCloseTo(surveyFoot, 7);
    // Over a mile the two feet differ by about 3 mm.
    expect(Math.abs(feetToMetres(5280) - 5280 * surveyFoot)).toBeGreaterThan(0.003);
  });

  it('round-trips feet through metres', () => {
    for (const feet of [0.5, 6, 12.25, 180, 5280]) expect(metresToFeet(feetToMetres(feet))).toBeCloseTo(feet, 10);
  });
});
