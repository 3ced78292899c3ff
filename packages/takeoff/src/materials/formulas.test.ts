import { describe, expect, it } from 'vitest';
import {
  bagCoverageSqFt,
  bagsFor,
  bankCubicYards,
  boxVolumeCuYd,
  ceilWhole,
  fastenersForClosedLoop,
  fastenersForOpenRun,
  loadsNeeded,
  looseFromBank,
  looseToCompactedFactor,
  roundUpTo,
  slopeFallIn,
  stockPieces,
  tonsFromCubicYards,
  tonsFromPoundsPerCubicYard,
  turfPieceWeightLb,
} from './formulas.js';

describe('TRADE check table: base and spoil', () => {
  it.each([
    // row 5 — arithmetic: 1,000 sq ft × 3 in = 250 cu ft = 9.26 cu yd compacted
    { area: 1000, depth: 3, cuYd: 9.26 },
    // row 6 — arithmetic: 108 sq ft at 3 in is exactly one cubic yard
    { area: 108, depth: 3, cuYd: 1 },
    // row 9 — arithmetic: 1,000 sq ft dug 4 in = 12.35 cu yd bank
    { area: 1000, depth: 4, cuYd: 12.35 },
  ])('$area sq ft at $depth in = $cuYd cu yd', ({ area, depth, cuYd }) => {
    expect(bankCubicYards(area, depth)).toBeCloseTo(cuYd, 2);
  });

  it('about 1 cu yd of base per 100 sq ft at about 3 in (≈8 % left for compaction and waste)', () => {
    // arithmetic: at 3 in one cubic yard covers 108 sq ft, so 100 sq ft needs 0.926 cu yd
    expect(bankCubicYards(100, 3)).toBeCloseTo(0.926, 3);
    expect(1 / bankCubicYards(100, 3)).toBeCloseTo(1.08, 2);
  });

  it('row 7: 9.26 cu yd of crushed stone at 1.35 tons per cu yd ≈ 12.5 tons', () => {
    // common practice, no published source (supplier conversion table)
    expect(tonsFromCubicYards(9.26, 1.35)).toBeCloseTo(12.5, 1);
  });

  it('row 8: 100 cu yd compacted gravel, swell 15 %, shrink 7 % → ≈123.7 cu yd loose', () => {
    // shrink/swell tables attributed to FHWA (2007) and Church (1981): factor 1.15 ÷ 0.93 = 1.237
    expect(looseToCompactedFactor(15, 7)).toBeCloseTo(1.237, 3);
    expect(100 * looseToCompactedFactor(15, 7)).toBeCloseTo(123.7, 1);
  });

  it('row 9: 12.35 cu yd bank at 25 % swell = 15.43 cu yd loose', () => {
    // arithmetic: loose = bank × (1 + swell)
    expect(looseFromBank(bankCubicYards(1000, 4), 25)).toBeCloseTo(15.43, 2);
  });

  it('row 10: 15.43 cu yd of loose dry earth weighs ≈16.2 tons and needs 2 loads under a 10-ton cap', () => {
    // CalRecycle volume-to-weight table: loose dry earth 2,100 lb per cu yd → 32,407 lb
    const loose = looseFromBank(bankCubicYards(1000, 4), 25);
    expect(loose * 2100).toBeCloseTo(32407, 0);
    const tons = tonsFromPoundsPerCubicYard(loose, 2100);
    expect(tons).toBeCloseTo(16.2, 1);
    // roll-off weight caps vary by hauler (common practice, no published source): 10 tons here
    expect(loadsNeeded(loose, tons, 20, 10)).toEqual({
      byVolume: 1,
      byWeight: 2,
      loads: 2,
      isWeightLimited: true,
    });
  });

  it('row 11: a 7 × 14 ft bed with 2 ft sides holds 7.26 cu yd struck', () => {
    // arithmetic
    expect(boxVolumeCuYd(14, 7, 2)).toBeCloseTo(7.26, 2);
  });

  it('row 16: a 30 ft run at 2 % falls 0.6 ft = 7.2 in', () => {
    // arithmetic; 2 % fall is quoted by several installers (common practice)
    expect(slopeFallIn(30, 2)).toBeCloseTo(7.2, 10);
  });
});

describe('TRADE check table: infill', () => {
  it.each([
    // row 12 — common practice, no published source: 600 sq ft landscape at 1.5 lb → 900 lb → 18 bags
    { area: 600, rate: 1.5, lb: 900, bags: 18 },
    // row 13 — common practice, no published source: 300 sq ft putting at 1.75 lb → 525 lb → 10.5 → 11 bags
    { area: 300, rate: 1.75, lb: 525, bags: 11 },
    // arithmetic: float products just over a whole number must not add a bag (0.1 × 3 × 1000 = 300.00000000000006)
    { area: 1000, rate: 0.1 * 3, lb: 300, bags: 6 },
  ])('$area sq ft at $rate lb per sq ft → $bags bags of 50 lb', ({ area, rate, lb, bags }) => {
    expect(area * rate).toBeCloseTo(lb, 6);
    expect(bagsFor(area * rate, 50)).toBe(bags);
  });

  it('row 14: a 50 lb bag covers 25 sq ft at 2 lb and 16.7 sq ft at 3 lb', () => {
    // common practice, no published source (supplier coverage figures)
    expect(bagCoverageSqFt(50, 2)).toBe(25);
    expect(bagCoverageSqFt(50, 3)).toBeCloseTo(16.7, 1);
  });
});

describe('TRADE check table: fasteners and roll weight', () => {
  it.each([
    // row 17 — arithmetic; spacing is a company setting (no published standard)
    { perimeter: 240, spacing: 6, nails: 480 },
    { perimeter: 240, spacing: 12, nails: 240 },
    { perimeter: 240.1, spacing: 12, nails: 241 },
    { perimeter: 0, spacing: 6, nails: 0 },
  ])('$perimeter lf closed loop at $spacing in → $nails', ({ perimeter, spacing, nails }) => {
    expect(fastenersForClosedLoop(perimeter, spacing)).toBe(nails);
  });

  it('an open run gets one fastener more than a closed loop of the same length', () => {
    // arithmetic: fence-post counting
    expect(fastenersForOpenRun(30, 36)).toBe(11);
    expect(fastenersForOpenRun(0, 36)).toBe(0);
  });

  it.each([
    // row 18 — common practice, no published source ([S10] backing weights): 166.67 sq yd × 92 oz = 958 lb
    { backingOz: 32, lb: 958 },
    // row 18 with latex backing (+40 oz): 1,042 lb
    { backingOz: 40, lb: 1042 },
  ])('15 × 100 ft roll, 60 oz face + $backingOz oz backing ≈ $lb lb', ({ backingOz, lb }) => {
    expect(Math.round(turfPieceWeightLb(15, 100, 60 + backingOz))).toBe(lb);
  });
});

describe('rounding helpers', () => {
  it('rounds up to an order increment without float noise', () => {
    expect(roundUpTo(11.45, 0.5)).toBe(11.5);
    expect(roundUpTo(0.1 * 3, 0.1)).toBe(0.3);
    expect(roundUpTo(12, 0.5)).toBe(12);
    expect(ceilWhole(18.000000000000004)).toBe(18);
    expect(ceilWhole(-2)).toBe(0);
  });

  it('counts stock pieces with waste', () => {
    // arithmetic: 76 lf × 1.10 ÷ 8 ft = 10.45 → 11 boards
    expect(stockPieces(76, 8, 10)).toBe(11);
    expect(stockPieces(80, 8, 0)).toBe(10);
  });
});
