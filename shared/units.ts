// Exact unit conversion: the international foot is 0.3048 m exactly
// (NIST SP 811 (2008) App. B.8; 24 FR 5348, 1959), so 1 ft² = 0.09290304 m² exactly.
// Sightline stores SI and converts only for display and entry.
export const METRES_PER_FOOT = 0.3048;
export const SQUARE_METRES_PER_SQUARE_FOOT = METRES_PER_FOOT * METRES_PER_FOOT;

export type LengthUnit = 'ft' | 'm';

export const feetToMetres = (feet: number) => feet * METRES_PER_FOOT;
export const metresToFeet = (metres: number) => metres / METRES_PER_FOOT;
export const squareFeetToSquareMetres = (sqft: number) => sqft * SQUARE_METRES_PER_SQUARE_FOOT;
export const squareMetresToSquareFeet = (sqm: number) => sqm / SQUARE_METRES_PER_SQUARE_FOOT;

export function toMetres(value: number, unit: LengthUnit) {
  return unit === 'm' ? value : feetToMetres(value);
}

export function fromMetres(metres: number, unit: LengthUnit) {
  return unit === 'm' ? metres : metresToFeet(metres);
}

export function toSquareMetres(value: number, unit: LengthUnit) {
  return unit === 'm' ? value : squareFeetToSquareMetres(value);
}

export function fromSquareMetres(sqm: number, unit: LengthUnit) {
  return unit === 'm' ? sqm : squareMetresToSquareFeet(sqm);
}

// For display: round to a sensible number of decimals without float noise.
export function roundTo(value: number, decimals: number) {
  const factor = 10 ** decimals;
  return Math.round((value + Number.EPSILON) * factor) / factor;
}

export const AREA_LABEL: Record<LengthUnit, string> = { ft: 'ft²', m: 'm²' };
