// Property: whatever was invoiced before, the final invoice makes the job's invoices add up to
// the accepted total plus the approved changes (with their tax), to the cent.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { invoiceTotalsOf, priceInvoiceLine } from './invoice-money.js';
import { planInvoice } from './invoice-plan.js';

const lineArb = fc.record({
  label: fc.constant('change'),
  quantity: fc.integer({ min: 0, max: 5_000_000 }).map((n) => n / 1000),
  unit: fc.constant('each'),
  unitPriceCents: fc.integer({ min: 0, max: 500_000 }),
  taxable: fc.boolean(),
});

describe('final invoice', () => {
  it('final + earlier invoices = accepted total + changes', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 100_000_000 }),
        fc.array(fc.integer({ min: 0, max: 1_000_000 }), { maxLength: 6 }),
        fc.array(lineArb, { maxLength: 10 }),
        fc.integer({ min: 0, max: 3000 }),
        (acceptedTotal, earlierTotals, changes, taxBp) => {
          fc.pre(earlierTotals.reduce((a, b) => a + b, 0) <= acceptedTotal);
          const plan = planInvoice({
            kind: 'final',
            estimate: { reference: 'E', totalCents: acceptedTotal, depositCents: 0 },
            lines: changes,
            earlier: earlierTotals.map((totalCents, i) => ({
              reference: `INV-${i}`,
              kind: 'progress' as const,
              totalCents,
            })),
            taxRateBasisPoints: taxBp,
          });
          const changeTotal = invoiceTotalsOf(changes.map(priceInvoiceLine), taxBp).totalCents;
          const earlier = earlierTotals.reduce((a, b) => a + b, 0);
          expect(plan.totalCents + earlier).toBe(acceptedTotal + changeTotal);
          expect(plan.totalCents).toBe(plan.subtotalCents + plan.taxCents);
        },
      ),
    );
  });
});
