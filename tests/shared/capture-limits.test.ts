import { areaProblem, lengthProblem, RECORD_LIMITS, wholeNumberProblem } from '../../shared/capture-limits';
import { fileTooLargeMessage, uploadProblem } from '../../shared/files';
import { feetToMetres } from '../../shared/units';

describe('record limits shared by the form and the server', () => {
  it('accepts a room up to 200 m long and names the limit in feet for a feet record', () => {
    // 200 m ÷ 0.3048 m/ft = 656.17 ft (international foot, NIST SP 811 App. B.8).
    expect(lengthProblem(656, 'ft', 'roomLengthM')).toBeNull();
    expect(lengthProblem(99999, 'ft', 'roomLengthM')).toBe('At most 656 ft (200 m)');
    expect(lengthProblem(200, 'm', 'roomWidthM')).toBeNull();
    expect(lengthProblem(200.5, 'm', 'roomWidthM')).toBe('At most 200 m');
    expect(feetToMetres(656)).toBeLessThan(RECORD_LIMITS.roomLengthM);
  });

  it('refuses negative and non-numeric sizes', () => {
    expect(lengthProblem(-14, 'ft', 'roomWidthM')).toBe('Enter a number, 0 or more');
    expect(areaProblem(Number.NaN, 'm')).toBe('Enter a number, 0 or more');
  });

  it('limits the area to 5000 m², which is 53 820 ft² (5000 ÷ 0.09290304)', () => {
    expect(areaProblem(53_800, 'ft')).toBeNull();
    expect(areaProblem(60_000, 'ft')).toBe('At most 53820 ft² (5000 m²)');
  });

  it('limits whole counts, as the server does', () => {
    expect(wholeNumberProblem(5000, 'totalStations')).toBeNull();
    expect(wholeNumberProblem(99_999_999_999, 'totalStations')).toBe('A whole number from 0 to 5000');
    expect(wholeNumberProblem(501, 'roomStations')).toBe('A whole number from 0 to 500');
    expect(wholeNumberProblem(2.5, 'roomStations')).toBe('A whole number from 0 to 500');
  });
});

describe('uploads refused before they are sent', () => {
  const MB = 1024 * 1024;
  it('names the limit and the size of a photo that is too large', () => {
    expect(uploadProblem('photo', { size: 30.2 * MB, type: 'image/jpeg' })).toBe('Photos up to 25 MB; this one is 30.2 MB.');
    expect(fileTooLargeMessage(25 * MB)).toBe('Files up to 25 MB.');
  });

  it('refuses a type that can never pass for its kind, and an empty file', () => {
    expect(uploadProblem('photo', { size: 1000, type: 'application/pdf' })).toBe(
      'Photos must be JPEG, PNG or WebP; this one is application/pdf.',
    );
    expect(uploadProblem('sketch', { size: 0, type: 'image/png' })).toBe('This file is empty.');
  });

  it('lets a station file through whatever the browser calls a CSV', () => {
    for (const type of ['', 'text/csv', 'text/plain', 'application/vnd.ms-excel'])
      expect(uploadProblem('station_coordinates', { size: 100, type })).toBeNull();
  });
});
