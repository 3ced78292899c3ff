import { describe, expect, it } from 'vitest';
import convert from 'convert-units';
import fc from 'fast-check';
import * as units from './conversions.js';

// convert-units is an independent reference; its metric ratios are rounded to about six
// significant figures (e.g. 10.7639 sq ft per m²), so we compare to a relative 1e-5.
const closeTo = (actual: number, expected: number): void => {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-5 * Math.max(1, Math.abs(expected)));
};

const cases: [string, (v: number) => number, string, string][] = [
  ['sq ft → sq yd', units.sqFtToSqYd, 'ft2', 'yd2'],
  ['sq yd → sq ft', units.sqYdToSqFt, 'yd2', 'ft2'],
  ['sq ft → m²', units.sqFtToSqM, 'ft2', 'm2'],
  ['m² → sq ft', units.sqMToSqFt, 'm2', 'ft2'],
  ['cu ft → cu yd', units.cuFtToCuYd, 'ft3', 'yd3'],
  ['cu yd → cu ft', units.cuYdToCuFt, 'yd3', 'ft3'],
  ['cu yd → m³', units.cuYdToCuM, 'yd3', 'm3'],
  ['m³ → cu yd', units.cuMToCuYd, 'm3', 'yd3'],
  ['lb → short ton', units.poundsToShortTons, 'lb', 't'],
  ['short ton → lb', units.shortTonsToPounds, 't', 'lb'],
  ['lb → kg', units.poundsToKilograms, 'lb', 'kg'],
  ['kg → lb', units.kilogramsToPounds, 'kg', 'lb'],
  ['oz → lb', units.ouncesToPounds, 'oz', 'lb'],
  ['in → ft', units.inchesToFeet, 'in', 'ft'],
  ['ft → in', units.feetToInches, 'ft', 'in'],
  ['ft → m', units.feetToMetres, 'ft', 'm'],
  ['m → ft', units.metresToFeet, 'm', 'ft'],
];

describe('conversions match convert-units', () => {
  it.each(cases)('%s', (_name, ours, from, to) => {
    for (const value of [0, 1, 9, 27, 108, 300, 1000, 2000, 12345.678])
      closeTo(ours(value), convert(value).from(from).to(to));
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), (value) =>
        closeTo(ours(value), convert(value).from(from).to(to)),
      ),
    );
  });
});

describe('trade check values', () => {
  it('300 sq ft is 33.33 sq yd', () => {
    // TRADE check row 4 ([S10], common practice, no published source)
    expect(units.sqFtToSqYd(300)).toBeCloseTo(33.333, 3);
  });

  it.each([
    // TRADE check row 5 (arithmetic): 1,000 sq ft at 3 in = 250 cu ft = 9.26 cu yd
    [1000, 3, 9.259],
    // TRADE check row 6 (arithmetic): 108 sq ft at 3 in = exactly 1 cu yd
    [108, 3, 1],
    // TRADE check row 9 (arithmetic): 1,000 sq ft dug 4 in = 12.35 cu yd bank
    [1000, 4, 12.346],
  ])('%d sq ft at %d in = %d cu yd', (area, depth, cuYd) => {
    expect(units.cubicYardsOfLayer(area, depth)).toBeCloseTo(cuYd, 3);
    closeTo(
      units.cubicYardsOfLayer(area, depth),
      convert((area * depth) / 12)
        .from('ft3')
        .to('yd3'),
    );
  });
});
