import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import type { TakeoffUsage } from '../settings/takeoff-settings-schema.js';
import { computeTakeoff } from './compute-takeoff.js';
import { bagsFor, fastenersForClosedLoop } from './formulas.js';
import type { TakeoffInput } from './takeoff-input.js';

const length = fc.double({ min: 0, max: 5000, noNaN: true });
const usage = fc.constantFrom<TakeoffUsage>('landscape', 'pet', 'play', 'putting');

const inputArbitrary: fc.Arbitrary<TakeoffInput> = fc
  .record({
    usage,
    areaSqFt: fc.double({ min: 0, max: 50000, noNaN: true }),
    perimeterFt: length,
    curvedShare: fc.double({ min: 0, max: 1, noNaN: true }),
    hardShare: fc.double({ min: 0, max: 0.5, noNaN: true }),
    bedShare: fc.double({ min: 0, max: 0.5, noNaN: true }),
    sideFt: length,
    buttFt: length,
    count: fc.nat(40),
    pieces: fc.array(
      fc.record({
        widthFt: fc.constantFrom(12, 15),
        lengthFt: fc.double({ min: 1, max: 150, noNaN: true }),
      }),
      { maxLength: 6 },
    ),
    face: fc.option(fc.double({ min: 20, max: 110, noNaN: true }), { nil: undefined }),
    rodentWire: fc.boolean(),
    hasPets: fc.boolean(),
    heads: fc.nat(30),
  })
  .map((r) => ({
    usage: r.usage,
    areaSqFt: r.areaSqFt,
    perimeterFt: r.perimeterFt,
    curvedPerimeterFt: r.perimeterFt * r.curvedShare,
    perimeterByTagFt: { hard: r.perimeterFt * r.hardShare, bed: r.perimeterFt * r.bedShare },
    seams: { sideFt: r.sideFt, buttFt: r.buttFt, count: r.count },
    turf: {
      orderedSqFt: r.pieces.reduce((sum, p) => sum + p.widthFt * p.lengthFt, 0),
      pieces: r.pieces,
      faceWeightOzPerSqYd: r.face,
      pileHeightIn: 1.5,
    },
    sprinklers: {
      halfInchHeads: r.heads,
      threeQuarterInchHeads: r.heads % 3,
      zonesClosed: r.heads % 2,
    },
    rodentWire: r.rodentWire,
    hasPets: r.hasPets,
  }));

describe('takeoff properties', () => {
  it('never gives a negative or non-finite quantity, and every line explains itself', () => {
    fc.assert(
      fc.property(inputArbitrary, (input) => {
        for (const line of computeTakeoff(input, defaultTakeoffSettings)) {
          expect(Number.isFinite(line.quantity)).toBe(true);
          expect(line.quantity).toBeGreaterThanOrEqual(0);
          expect(line.rawQuantity).toBeGreaterThanOrEqual(0);
          expect(line.rule.length).toBeGreaterThan(0);
          expect(line.rounding.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('orders at least the computed amount whenever it rounds', () => {
    fc.assert(
      fc.property(inputArbitrary, (input) => {
        for (const line of computeTakeoff(input, defaultTakeoffSettings)) {
          // Rounding up ignores float noise below 1e-9 (so 10.000000001 bags stay 10), hence
          // the slack: a raw 1.0000000001e-9 legitimately rounds to 0.
          if (line.rounding.startsWith('rounded up'))
            expect(line.quantity).toBeGreaterThanOrEqual(line.rawQuantity - 2e-9);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('perimeter nails never fall as the perimeter grows', () => {
    fc.assert(
      fc.property(length, length, fc.double({ min: 1, max: 24, noNaN: true }), (a, b, spacing) => {
        const [short, long] = a <= b ? [a, b] : [b, a];
        expect(fastenersForClosedLoop(short, spacing)).toBeLessThanOrEqual(
          fastenersForClosedLoop(long, spacing),
        );
      }),
    );
    fc.assert(
      fc.property(length, length, (a, b) => {
        const nails = (perimeterFt: number) =>
          computeTakeoff(
            {
              usage: 'landscape',
              areaSqFt: 100,
              perimeterFt,
              seams: { sideFt: 0, buttFt: 0, count: 0 },
              turf: { orderedSqFt: 100, pieces: [] },
            },
            defaultTakeoffSettings,
          ).find((l) => l.key === 'perimeter-nails')?.quantity ?? 0;
        const [short, long] = a <= b ? [a, b] : [b, a];
        expect(nails(short)).toBeLessThanOrEqual(nails(long));
      }),
      { numRuns: 200 },
    );
  });

  it('bags × bag size always covers the pounds needed, with less than one bag spare', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.constantFrom(25, 40, 50, 2000),
        (pounds, bagLb) => {
          const bags = bagsFor(pounds, bagLb);
          expect(bags * bagLb).toBeGreaterThanOrEqual(pounds - 1e-6);
          expect((bags - 1) * bagLb).toBeLessThan(pounds + 1e-6);
        },
      ),
    );
  });

  it('infill bags in the takeoff cover rate × area for every layer', () => {
    fc.assert(
      fc.property(inputArbitrary, (input) => {
        const lines = computeTakeoff(input, defaultTakeoffSettings);
        for (const layer of defaultTakeoffSettings.infill[input.usage].layers) {
          const line = lines.find((l) => l.key === `infill:${layer.key}`);
          if (input.areaSqFt > 0)
            expect((line?.quantity ?? 0) * layer.bagLb).toBeGreaterThanOrEqual(
              layer.rateLbPerSqFt * input.areaSqFt - 1e-6,
            );
        }
      }),
      { numRuns: 200 },
    );
  });
});
