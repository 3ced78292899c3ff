// Property test: the estimate arithmetic agrees with exact rational arithmetic (BigInt
// numerators and denominators, rounded by comparing the remainder with half the divisor).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { priceLine, totalsOf } from './estimate-lines.js';
import type { EstimateDepositRule } from './estimate-lines.js';
import { markedUpUnitPriceCents } from './money.js';

/** Exact n/d (d > 0, n ≥ 0) rounded half-up, the long way round. */
function roundRational(n: bigint, d: bigint): bigint {
  const q = n / d;
  const r = n % d;
  return r * 2n >= d ? q + 1n : q;
}

const lineArb = fc.record({
  thousandths: fc.integer({ min: 0, max: 50_000_000 }), // quantity up to 50,000 with 3 decimals
  unitPriceCents: fc.integer({ min: 0, max: 5_000_000 }),
  taxable: fc.boolean(),
});
const depositArb: fc.Arbitrary<EstimateDepositRule> = fc.oneof(
  fc.record({
    kind: fc.constant('percent' as const),
    basisPoints: fc.integer({ min: 0, max: 10_000 }),
  }),
  fc.record({
    kind: fc.constant('amount' as const),
    cents: fc.integer({ min: 0, max: 100_000_000 }),
  }),
);

describe('estimate arithmetic against exact rationals', () => {
  it('lines, subtotal, tax, total and deposit', () => {
    fc.assert(
      fc.property(
        fc.array(lineArb, { maxLength: 30 }),
        fc.integer({ min: 0, max: 3000 }),
        depositArb,
        (raw, taxBp, deposit) => {
          const lines = raw.map((l, i) =>
            priceLine({
              id: `l${i}`,
              key: 'k',
              label: 'L',
              quantity: l.thousandths / 1000,
              unit: 'ea',
              unitPriceCents: l.unitPriceCents,
              taxable: l.taxable,
              source: 'manual',
            }),
          );
          let subtotal = 0n;
          let taxable = 0n;
          raw.forEach((l, i) => {
            const exact = roundRational(BigInt(l.thousandths) * BigInt(l.unitPriceCents), 1000n);
            expect(BigInt(lines[i]?.amountCents ?? -1)).toBe(exact);
            subtotal += exact;
            if (l.taxable) taxable += exact;
          });
          const tax = roundRational(taxable * BigInt(taxBp), 10_000n);
          const total = subtotal + tax;
          const wanted =
            deposit.kind === 'percent'
              ? roundRational(total * BigInt(deposit.basisPoints), 10_000n)
              : BigInt(deposit.cents);
          const totals = totalsOf(lines, { taxRateBasisPoints: taxBp, depositRule: deposit });
          expect(totals).toEqual({
            subtotalCents: Number(subtotal),
            taxableSubtotalCents: Number(taxable),
            taxCents: Number(tax),
            totalCents: Number(total),
            depositCents: Number(wanted < total ? wanted : total),
          });
          expect(totals.depositCents).toBeLessThanOrEqual(totals.totalCents);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('marked-up unit prices', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 10_000_000_000 }),
        fc.integer({ min: 0, max: 100_000 }),
        (millicents, markup) => {
          const exact = roundRational(BigInt(millicents) * BigInt(10_000 + markup), 10_000_000n);
          expect(BigInt(markedUpUnitPriceCents(millicents, markup))).toBe(exact);
        },
      ),
    );
  });
});
