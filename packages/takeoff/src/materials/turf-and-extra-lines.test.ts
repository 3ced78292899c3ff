import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import { computeTakeoff } from './compute-takeoff.js';
import { jobInput, keysOf, lineOf, settingsWith } from './test-support.js';

describe('turf and roll weight', () => {
  it('orders what the plan bought and states the waste', () => {
    // TRADE row 1 (derived): two 15 × 20 ft pieces = 600 sq ft
    const input = jobInput({
      areaSqFt: 560,
      turf: {
        orderedSqFt: 600,
        pieces: [
          { widthFt: 15, lengthFt: 20 },
          { widthFt: 15, lengthFt: 20 },
        ],
      },
    });
    const line = lineOf('turf', input);
    expect(line.quantity).toBe(600);
    expect(line.rule).toBe(
      '2 × (15 × 20 ft) = 600 sq ft ordered for 560 sq ft of area (40 sq ft waste, 6.7 % of the order)',
    );
  });

  it.each([
    // TRADE row 18 — [S10] backing weights (common practice, no published source); NIOSH 51 lb limit via an OSHA eTool
    { backing: 'polyurethane' as const, lb: 958 },
    { backing: 'latex' as const, lb: 1042 },
  ])(
    'a 15 × 100 ft roll, 60 oz face, $backing backing weighs $lb lb and is flagged',
    ({ backing, lb }) => {
      const input = jobInput({
        turf: {
          orderedSqFt: 1500,
          pieces: [{ widthFt: 15, lengthFt: 100 }],
          faceWeightOzPerSqYd: 60,
          backing,
        },
      });
      const line = lineOf('roll-weight', input);
      expect(line.quantity).toBe(lb);
      expect(line.warnings[0]).toMatch(/over the 51 lb one-person lift limit/);
    },
  );

  it('does not flag a light offcut', () => {
    // arithmetic: 2 × 3 ft = 0.67 sq yd × 100 oz ÷ 16 = 4.17 lb
    const input = jobInput({
      turf: { orderedSqFt: 6, pieces: [{ widthFt: 2, lengthFt: 3 }], faceWeightOzPerSqYd: 60 },
    });
    expect(lineOf('roll-weight', input).warnings).toEqual([]);
  });

  it('skips the roll weight when the face weight is unknown', () => {
    expect(keysOf(jobInput())).not.toContain('roll-weight');
  });
});

describe('sprinkler caps, rodent wire, labour', () => {
  it('caps each removed head by size and each closed zone with a 1 in cap', () => {
    const input = jobInput({
      sprinklers: { halfInchHeads: 6, threeQuarterInchHeads: 2, zonesClosed: 1 },
    });
    expect(lineOf('sprinkler-caps-half-inch', input).quantity).toBe(6);
    expect(lineOf('sprinkler-caps-three-quarter-inch', input).quantity).toBe(2);
    const zone = lineOf('sprinkler-caps-zone', input);
    expect(zone.quantity).toBe(1);
    expect(zone.label).toBe('Sprinkler caps, 1 in');
  });

  it('adds the overlap between rodent wire strips', () => {
    // arithmetic: 1,000 × 4 ÷ 3.5 = 1,142.86 sq ft ÷ 400 sq ft per roll = 2.86 → 3 rolls
    const line = lineOf('rodent-wire', jobInput({ rodentWire: true }));
    expect(line.inputs['wireSqFt']).toBeCloseTo(1142.86, 2);
    expect(line.quantity).toBe(3);
    expect(keysOf(jobInput())).not.toContain('rodent-wire');
  });

  it('uses the job strip width when given', () => {
    // arithmetic: 1,000 × 3 ÷ 2.5 = 1,200 sq ft ÷ 300 = 4 rolls
    expect(lineOf('rodent-wire', jobInput({ rodentWire: true, stripWidthFt: 3 })).quantity).toBe(4);
  });

  it('turns production rates into crew-hours and rental days', () => {
    // production rates are from memory (company settings); the arithmetic is what is checked
    const input = jobInput({ areaSqFt: 1260, seams: { sideFt: 45, buttFt: 0, count: 3 } });
    const install = lineOf('labour-install', input);
    expect(install.rawQuantity).toBeCloseTo(12.6, 10); // 1,260 ÷ 100 sq ft per crew-hour
    expect(install.quantity).toBe(13); // rounded up to the next ½ h
    expect(lineOf('labour-seams', input).quantity).toBe(2.5); // 45 lf ÷ 20 lf per hour = 2.25 → 2.5
    expect(lineOf('equipment:sod-cutter', input).quantity).toBe(1); // 1,260 ÷ 3,000 → 1 day
    expect(lineOf('equipment:plate-compactor', input).quantity).toBe(1);
    expect(lineOf('equipment:power-broom', input).quantity).toBe(1);
    expect(lineOf('equipment:plate-compactor', jobInput({ areaSqFt: 4100 })).quantity).toBe(3); // 4,100 ÷ 2,000 = 2.05
  });
});

describe('input checks', () => {
  it('refuses negative areas and curves longer than the perimeter', () => {
    expect(() => computeTakeoff(jobInput({ areaSqFt: -1 }), defaultTakeoffSettings)).toThrow(
      ZodError,
    );
    expect(() =>
      computeTakeoff(jobInput({ curvedPerimeterFt: 300 }), defaultTakeoffSettings),
    ).toThrow(ZodError);
    expect(() =>
      computeTakeoff(
        jobInput({ perimeterByTagFt: { hard: 200, bed: 100 } }),
        defaultTakeoffSettings,
      ),
    ).toThrow(ZodError);
  });

  it('refuses settings that fail their schema', () => {
    const settings = settingsWith({
      labour: { ...defaultTakeoffSettings.labour, seamFtPerHour: 0 },
    });
    expect(() => computeTakeoff(jobInput(), settings)).toThrow(ZodError);
  });
});
