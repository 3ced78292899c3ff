import { describe, expect, it } from 'vitest';
import { depositFor, totalsOf, priceLine } from './estimate-lines.js';
import type { EstimateDepositRule, EstimateLineInput } from './estimate-lines.js';
import {
  basisPointsOf,
  divideHalfUp,
  ESTIMATE_ROUNDING_RULE,
  lineAmountCents,
  markedUpUnitPriceCents,
  MoneyInputError,
} from './money.js';

// Rounding half-up to the cent is common practice for invoices and estimates (no single
// published source); every expected value below was worked by hand.

describe('divideHalfUp', () => {
  it.each([
    [5n, 2n, 3n], // 2.5 → 3
    [7n, 3n, 2n], // 2.33… → 2
    [8n, 3n, 3n], // 2.66… → 3
    [0n, 7n, 0n],
    [-5n, 2n, -3n], // half away from zero
  ])('%d / %d = %d', (num, den, expected) => {
    expect(divideHalfUp(num, den)).toBe(expected);
  });
});

describe('markedUpUnitPriceCents (worked by hand)', () => {
  it.each([
    // [millicents, markup bp, cents, working]
    [240_000, 0, 240, '$2.40, no markup'],
    [240_000, 1500, 276, '$2.40 × 1.15 = $2.76'],
    [12_500, 0, 13, '$0.125 → 12.5 ¢ → 13 ¢ (half-up)'],
    [12_500, 2000, 15, '$0.125 × 1.2 = 15 ¢ exactly'],
    [125_000, 3333, 167, '$1.25 × 1.3333 = 166.6625 ¢ → 167 ¢'],
    [3_800_000, 1500, 4370, '$38 × 1.15 = $43.70'],
    [1_000, 5000, 2, '1 ¢ × 1.5 = 1.5 ¢ → 2 ¢'],
  ])('%d mc with %d bp → %d ¢ (%s)', (millicents, markup, cents) => {
    expect(markedUpUnitPriceCents(millicents, markup)).toBe(cents);
  });
});

describe('lineAmountCents (worked by hand)', () => {
  it.each([
    [6.5, 3800, 24_700, '6.5 t × $38 = $247.00'],
    [6.17, 333, 2055, '6.17 × 3.33 = 20.5461 → $20.55'],
    [0.5, 1, 1, '0.5 ¢ → 1 ¢ (half-up)'],
    [2.35, 1, 2, '2.35 ¢ → 2 ¢ (no float drift: 2.35 is not 2.3499…)'],
    [452.25, 276, 124_821, '452.25 × $2.76 = $1,248.21'],
    [1.005, 100, 101, '1.005 × $1 = 100.5 ¢ → 101 ¢ (float would say 100.49999)'],
    [0, 999, 0, 'nothing'],
  ])('%d × %d ¢ = %d ¢ (%s)', (quantity, unit, amount) => {
    expect(lineAmountCents(quantity, unit)).toBe(amount);
  });

  it('refuses fractional cents, negative and over-precise quantities', () => {
    expect(() => lineAmountCents(1, 1.5)).toThrow(MoneyInputError);
    expect(() => lineAmountCents(-1, 100)).toThrow(MoneyInputError);
    expect(() => lineAmountCents(1.0000001, 100)).toThrow(/decimal places/);
  });
});

describe('tax and deposit (worked by hand)', () => {
  it.each([
    [10_001, 825, 825, '10,001 × 8.25 % = 825.0825 → 825'],
    [10_006, 825, 825, '825.495 → 825'],
    [10_007, 825, 826, '825.5775 → 826'],
    [200, 825, 17, '16.5 → 17 (half-up)'],
    [0, 825, 0, 'nothing taxable'],
  ])('tax on %d ¢ at %d bp = %d ¢ (%s)', (cents, bp, tax) => {
    expect(basisPointsOf(cents, bp, 'tax')).toBe(tax);
  });

  it.each<[number, EstimateDepositRule, number, string]>([
    [99_999, { kind: 'percent', basisPoints: 3000 }, 30_000, '29,999.7 → 30,000'],
    [30_000, { kind: 'amount', cents: 50_000 }, 30_000, 'capped at the total'],
    [30_000, { kind: 'amount', cents: 5_000 }, 5_000, 'fixed amount'],
    [12_345, { kind: 'percent', basisPoints: 10_000 }, 12_345, '100 % is the total'],
    [0, { kind: 'percent', basisPoints: 3000 }, 0, 'empty estimate'],
  ])('deposit on %d ¢ with %j = %d ¢ (%s)', (total, rule, deposit) => {
    expect(depositFor(total, rule)).toBe(deposit);
  });
});

describe('totalsOf (worked by hand)', () => {
  const line = (over: Partial<EstimateLineInput>): EstimateLineInput => ({
    id: 'x',
    key: 'k',
    label: 'L',
    quantity: 1,
    unit: 'ea',
    unitPriceCents: 0,
    taxable: true,
    source: 'takeoff',
    ...over,
  });

  it('sums rounded lines, taxes the taxable part once and puts the deposit inside the total', () => {
    const lines = [
      line({ quantity: 450, unitPriceCents: 276 }), // 124,200
      line({ quantity: 6.5, unitPriceCents: 4370 }), // 28,405
      line({ quantity: 1, unitPriceCents: 15_000, taxable: false, source: 'manual' }), // 15,000
    ].map(priceLine);
    expect(lines.map((l) => l.amountCents)).toEqual([124_200, 28_405, 15_000]);
    // subtotal 167,605; taxable 152,605 × 8.25 % = 12,589.9125 → 12,590; total 180,195;
    // deposit 30 % = 54,058.5 → 54,059.
    expect(
      totalsOf(lines, {
        taxRateBasisPoints: 825,
        depositRule: { kind: 'percent', basisPoints: 3000 },
      }),
    ).toEqual({
      subtotalCents: 167_605,
      taxableSubtotalCents: 152_605,
      taxCents: 12_590,
      totalCents: 180_195,
      depositCents: 54_059,
    });
  });

  it('taxes the subtotal once, not per line', () => {
    // Three lines of 10 ¢ at 5 %: per line 0.5 → 1 ¢ each would give 3 ¢; once on 30 ¢ is
    // 1.5 → 2 ¢.
    const lines = [1, 2, 3].map((n) => priceLine(line({ id: `l${n}`, unitPriceCents: 10 })));
    const totals = totalsOf(lines, {
      taxRateBasisPoints: 500,
      depositRule: { kind: 'amount', cents: 0 },
    });
    expect(totals.taxCents).toBe(2);
    expect(totals.totalCents).toBe(32);
  });

  it('states the rule in a sentence', () => {
    expect(ESTIMATE_ROUNDING_RULE.sentence).toMatch(/half-up/);
  });
});
