import { CONTRAST_PAIRS } from '../../components/ui/theme';
import { contrastRatio, relativeLuminance } from '../../shared/contrast';

describe('WCAG 2.1 contrast ratio', () => {
  // Source: WCAG 2.1 definitions of relative luminance and contrast ratio; the extremes and the
  // well-known #767676-on-white figure (4.54:1) are published in WCAG's own understanding docs
  // and reproduced by every contrast checker.
  it('gives 21:1 for black on white and 1:1 for a colour on itself', () => {
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 10);
    expect(contrastRatio('#B85227', '#B85227')).toBeCloseTo(1, 10);
    expect(relativeLuminance('#FFFFFF')).toBeCloseTo(1, 12);
  });

  it('gives 4.54:1 for #767676 on white', () => {
    expect(contrastRatio('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
  });

  it('finds the old palette values just short of 4.5:1, as the audit measured (4.42 to 4.43)', () => {
    for (const [fg, bg] of [
      ['#FFFFFF', '#C4572A'],
      ['#6B7280', '#F7F5F0'],
      ['#A86A12', '#FFFFFF'],
    ]) {
      expect(contrastRatio(fg, bg)).toBeGreaterThan(4.4);
      expect(contrastRatio(fg, bg)).toBeLessThan(4.5);
    }
  });
});

describe("Sightline's palette", () => {
  it.each(CONTRAST_PAIRS.map((p) => [p.name, p] as const))('%s meets its minimum', (_name, pair) => {
    expect(contrastRatio(pair.foreground, pair.background)).toBeGreaterThanOrEqual(pair.minimum);
  });
});
