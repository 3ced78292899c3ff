import { describe, expect, it } from 'vitest';
import {
  formatArea,
  formatFeetInches,
  formatLength,
  formatLengthRange,
  formatNumber,
} from './format-length.js';
import { parseLength } from './parse-length.js';

describe('formatFeetInches', () => {
  it.each<[number, 1 | 0.5 | 0.25 | 0.125 | undefined, string]>([
    [27.5, undefined, `27' 6"`],
    [27, 1, `27' 0"`],
    [27 + 6.5 / 12, 0.5, `27' 6 1/2"`],
    [27 + 6.5 / 12, 1, `27' 7"`], // 6.5 in rounds half up to 7 in
    [27 + 6.25 / 12, 0.25, `27' 6 1/4"`],
    [27 + 6.75 / 12, 0.25, `27' 6 3/4"`],
    [27 + 6.375 / 12, 0.125, `27' 6 3/8"`],
    [27 + 11.9 / 12, 0.5, `28' 0"`], // carries into the next foot
    [0.25, 0.5, `0' 3"`],
    [1250, 1, `1,250' 0"`],
    [-2.5, 1, `-2' 6"`],
    [-0.001, 1, `0' 0"`],
  ])('%d ft at %s in → %s', (feet, precisionIn, expected) => {
    expect(formatFeetInches(feet, precisionIn === undefined ? {} : { precisionIn })).toBe(expected);
  });

  it('refuses a number that is not finite', () => {
    expect(() => formatFeetInches(Number.NaN)).toThrow(RangeError);
  });
});

describe('formatLength, formatArea and formatNumber', () => {
  it('uses metres for metric companies', () => {
    expect(formatLength(27.5, { system: 'metric' })).toBe('8.38 m'); // 27.5 × 0.3048 = 8.382
    expect(formatLength(27.5, { system: 'imperial' })).toBe(`27' 6"`);
  });

  it('shows areas in the asked unit', () => {
    // TRADE check row 4 ([S10], common practice, no published source): 20 × 15 ft = 300 sq ft = 33.33 sq yd
    expect(formatArea(300, { unit: 'sq yd' })).toBe('33.33 sq yd');
    expect(formatArea(1000)).toBe('1,000 sq ft');
    expect(formatArea(1000, { system: 'metric' })).toBe('92.9 m²'); // arithmetic: 1,000 × 0.09290304
  });

  it('groups thousands and trims decimals', () => {
    expect(formatNumber(32407.407)).toBe('32,407.41');
    expect(formatNumber(12.5, 0)).toBe('13');
    expect(formatNumber(-0.0001)).toBe('0');
  });
});

describe('metric lengths', () => {
  // 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959).
  it.each([
    [1, '0.3 m'],
    [10, '3.05 m'], // 3.048
    [15, '4.57 m'], // 4.572
    [100, '30.48 m'],
    [1000 / 0.3048, '1,000 m'],
  ])('%d ft → %s', (feet, expected) => {
    expect(formatLength(feet, { system: 'metric' })).toBe(expected);
  });

  it('reads back what it shows, within half a centimetre', () => {
    for (const feet of [0.5, 3.25, 20.5, 32.5, 99.99, 250]) {
      const shown = formatLength(feet, { system: 'metric' });
      const read = parseLength(shown, { system: 'metric' });
      expect(read.ok).toBe(true);
      if (read.ok) expect(Math.abs(read.feet - feet) * 0.3048).toBeLessThanOrEqual(0.005);
    }
  });

  it('gives a range in the company’s system', () => {
    expect(formatLengthRange(0, 15, { system: 'imperial' })).toBe(`0' 0"–15' 0"`);
    expect(formatLengthRange(2.5, 20.25, { system: 'imperial' })).toBe(`2' 6"–20' 3"`);
    expect(formatLengthRange(0, 15, { system: 'metric' })).toBe('0–4.57 m'); // 15 × 0.3048 = 4.572
  });
});
