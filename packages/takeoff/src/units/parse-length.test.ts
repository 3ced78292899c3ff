import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseLength } from './parse-length.js';
import type { LengthParseErrorCode, MeasurementSystem } from './parse-length.js';
import { formatFeetInches } from './format-length.js';

const feetOf = (text: string, system: MeasurementSystem = 'imperial'): number => {
  const result = parseLength(text, { system });
  if (!result.ok)
    throw new Error(
      `expected "${text}" to parse, got ${result.error.code}: ${result.error.message}`,
    );
  return result.feet;
};

describe('parseLength accepts what people type', () => {
  // arithmetic: inches ÷ 12; metres ÷ 0.3048 (exact definition of the foot)
  it.each([
    [`27' 6"`, 27.5],
    [`27'6"`, 27.5],
    [`27'6`, 27.5],
    [`27′ 6″`, 27.5],
    [`27’ 6”`, 27.5],
    [`27 ft 6 in`, 27.5],
    [`27 feet 6 inches`, 27.5],
    [`27ft6in`, 27.5],
    [`27 FT`, 27],
    [`27ft`, 27],
    [`27'`, 27],
    [`1 foot`, 1],
    [`6 in`, 0.5],
    [`6"`, 0.5],
    [`6''`, 0.5],
    [`3 inch`, 0.25],
    [`27.5`, 27.5],
    [` 27.5 `, 27.5],
    [`.5`, 0.5],
    [`27.`, 27],
    [`27 1/2`, 27.5],
    [`1/2`, 0.5],
    [`27' 6 1/2"`, 27 + 6.5 / 12],
    [`0' 11 3/4"`, 11.75 / 12],
    [`1,250 ft`, 1250],
    [`1,250`, 1250],
    [`0`, 0],
    [`0' 0"`, 0],
  ])('imperial %s → %d ft', (text, expected) => {
    expect(feetOf(text)).toBeCloseTo(expected, 10);
  });

  it.each([
    [`8.4 m`, 8.4 / 0.3048],
    [`8.4`, 8.4 / 0.3048],
    [`8.4m`, 8.4 / 0.3048],
    [`8.4 metres`, 8.4 / 0.3048],
    [`840 cm`, 8.4 / 0.3048],
    [`250 mm`, 0.25 / 0.3048],
    [`27' 6"`, 27.5],
    [`6 in`, 0.5],
  ])('metric %s → %d ft', (text, expected) => {
    expect(feetOf(text, 'metric')).toBeCloseTo(expected, 10);
  });

  it('reads a bare number as feet for imperial companies and metres for metric ones', () => {
    expect(feetOf('10', 'imperial')).toBe(10);
    expect(feetOf('10', 'metric')).toBeCloseTo(32.8083989501, 9);
  });

  it('takes metres in an imperial company when the unit is written', () => {
    expect(feetOf('3 m', 'imperial')).toBeCloseTo(3 / 0.3048, 10);
  });
});

describe('parseLength names what is wrong', () => {
  it.each<[string, LengthParseErrorCode]>([
    ['', 'empty'],
    ['   ', 'empty'],
    ['-3', 'negative'],
    [`-27' 6"`, 'negative'],
    ['−2 ft', 'negative'],
    ['abc', 'unrecognised'],
    ['27 6', 'unrecognised'],
    ['6 in 27 ft', 'unrecognised'],
    [`27' 6" 3"`, 'unrecognised'],
    ['27 yd', 'unrecognised'],
    ['27 min', 'unrecognised'],
    ['1e5', 'unrecognised'],
    ['27-6', 'unrecognised'],
    ['8,4 m', 'unrecognised'],
    ['8 m 40 cm', 'unrecognised'],
    ['ft', 'unrecognised'],
    ['9'.repeat(400), 'unrecognised'],
    [`27' 12"`, 'inches-out-of-range'],
    [`27' 14"`, 'inches-out-of-range'],
    ['27 ft 12.5 in', 'inches-out-of-range'],
    [`27.5' 3"`, 'fractional-feet-with-inches'],
    ['1/0', 'bad-fraction'],
    ['6 3/2', 'bad-fraction'],
    ['6 1/0 in', 'bad-fraction'],
    [`2 m 3 in`, 'mixed-systems'],
    [`2 ft 30 cm`, 'mixed-systems'],
  ])('%j → %s', (text, code) => {
    const result = parseLength(text, { system: 'imperial' });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe(code);
      expect(result.error.message.length).toBeGreaterThan(5);
    }
  });

  it('says why 14 inches after feet is refused and what to write instead', () => {
    const result = parseLength(`27' 14"`, { system: 'imperial' });
    expect(result).toEqual({
      ok: false,
      error: {
        code: 'inches-out-of-range',
        message: `Inches must be less than 12 when feet are given (14 in is 1 ft 2 in); write 28' 2"`,
      },
    });
  });
});

describe('parseLength and formatFeetInches agree', () => {
  it('reads back what it formats, within half the inch precision', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.constantFrom<1 | 0.5 | 0.25 | 0.125>(1, 0.5, 0.25, 0.125),
        (feet, precisionIn) => {
          const text = formatFeetInches(feet, { precisionIn });
          const back = parseLength(text, { system: 'imperial' });
          expect(back.ok).toBe(true);
          if (back.ok)
            expect(Math.abs(back.feet - feet) * 12).toBeLessThanOrEqual(precisionIn / 2 + 1e-9);
        },
      ),
    );
  });

  it('never throws on arbitrary text', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const result = parseLength(text, { system: 'metric' });
        if (result.ok) expect(result.feet).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});
