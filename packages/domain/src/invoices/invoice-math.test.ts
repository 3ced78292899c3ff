import { describe, expect, it } from 'vitest';
import { MoneyInputError } from '../estimates/money.js';
import { invoiceTotalsOf, priceInvoiceLine } from './invoice-money.js';
import { InvoicePlanError, planInvoice } from './invoice-plan.js';
import { invoiceBalanceCents, invoiceStatusOn, settledStatus } from './invoice-status.js';

// Half-up to the cent per line and once on the taxable subtotal: common practice for invoices,
// no published source (the same rule as the estimates). Every expected value was worked by hand.

const line = (unitPriceCents: number, quantity = 1, taxable = true) => ({
  label: 'L',
  quantity,
  unit: 'each',
  unitPriceCents,
  taxable,
});

describe('priceInvoiceLine (worked by hand)', () => {
  it.each([
    [2.5, 333, 833, '2.5 × $3.33 = 832.5 ¢ → 833 ¢'],
    [1, -12_345, -12_345, 'a deduction stays exact'],
    [0.5, -1, -1, '−0.5 ¢ → −1 ¢ (half away from zero)'],
    [3, 0, 0, 'a free line'],
  ])('%d × %d ¢ = %d ¢ (%s)', (quantity, unit, amount) => {
    expect(priceInvoiceLine(line(unit, quantity)).amountCents).toBe(amount);
  });
});

describe('invoiceTotalsOf (worked by hand)', () => {
  it('taxes once on the taxable subtotal, half-up', () => {
    // Taxable 1,000.05 + 0.10 = 1,000.15 (100,015 ¢); 8.25 % of it = 8,251.2375 ¢ → 82.51.
    // Untaxed 50.00; subtotal 1,050.15; total 1,050.15 + 82.51 = 1,132.66.
    const lines = [line(100_005), line(10), line(5000, 1, false)].map(priceInvoiceLine);
    expect(invoiceTotalsOf(lines, 825)).toEqual({
      subtotalCents: 105_015,
      taxableSubtotalCents: 100_015,
      taxCents: 8251,
      totalCents: 113_266,
    });
  });

  it('rounds the sum, not each line', () => {
    // Three lines of 0.06 at 8.25 %: per line 0.495 ¢ → 0 ¢ each (0 ¢ in all);
    // once on 0.18: 1.485 ¢ → 1 ¢.
    const lines = [line(6), line(6), line(6)].map(priceInvoiceLine);
    expect(invoiceTotalsOf(lines, 825).taxCents).toBe(1);
  });

  it('refuses a taxable subtotal below zero', () => {
    const lines = [line(100), line(-200)].map(priceInvoiceLine);
    expect(() => invoiceTotalsOf(lines, 825)).toThrow(MoneyInputError);
  });
});

const estimate = { reference: 'E-abc v1', totalCents: 1_082_500, depositCents: 324_750 };

describe('planInvoice (worked by hand)', () => {
  it('deposit: the accepted estimate’s deposit, untaxed', () => {
    const plan = planInvoice({
      kind: 'deposit',
      estimate,
      lines: [],
      earlier: [],
      taxRateBasisPoints: 825,
    });
    expect(plan.totalCents).toBe(324_750);
    expect(plan.taxCents).toBe(0);
  });

  it('deposit and final need an accepted estimate; progress needs lines', () => {
    for (const kind of ['deposit', 'final'] as const)
      expect(() =>
        planInvoice({ kind, estimate: null, lines: [], earlier: [], taxRateBasisPoints: 0 }),
      ).toThrow(InvoicePlanError);
    expect(() =>
      planInvoice({ kind: 'progress', estimate, lines: [], earlier: [], taxRateBasisPoints: 0 }),
    ).toThrow(/needs lines/);
  });

  it('progress: the typed lines, taxed', () => {
    // 2 days × $450.00 taxable = 900.00; 8.25 % = 74.25 → 974.25.
    const plan = planInvoice({
      kind: 'progress',
      estimate,
      lines: [line(45_000, 2)],
      earlier: [],
      taxRateBasisPoints: 825,
    });
    expect(plan.totalCents).toBe(97_425);
  });

  it('final: accepted total + changes − earlier invoices', () => {
    // 10,825.00 accepted; change 120 sq ft × $4.10 = 492.00 taxable, tax 8.25 % = 40.59;
    // less deposit 3,247.50 and progress 974.25:
    // 10,825.00 + 492.00 + 40.59 − 3,247.50 − 974.25 = 7,135.84.
    const plan = planInvoice({
      kind: 'final',
      estimate,
      lines: [line(410, 120)],
      earlier: [
        { reference: 'INV-000001', kind: 'deposit', totalCents: 324_750 },
        { reference: 'INV-000002', kind: 'progress', totalCents: 97_425 },
      ],
      taxRateBasisPoints: 825,
    });
    expect(plan.taxCents).toBe(4059);
    expect(plan.totalCents).toBe(713_584);
    expect(plan.lines.map((l) => l.amountCents)).toEqual([1_082_500, 49_200, -324_750, -97_425]);
  });

  it('final below zero is refused (a credit note is the way)', () => {
    expect(() =>
      planInvoice({
        kind: 'final',
        estimate,
        lines: [],
        earlier: [{ reference: 'INV-1', kind: 'progress', totalCents: 2_000_000 }],
        taxRateBasisPoints: 0,
      }),
    ).toThrow(/credit note/);
  });
});

describe('balance and status (common practice, no published source)', () => {
  const money = { totalCents: 10_000, paidCents: 0, refundedCents: 0, creditedCents: 0 };
  it.each([
    [{ ...money }, 10_000, 'sent'],
    [{ ...money, paidCents: 4000 }, 6000, 'partly_paid'],
    [{ ...money, paidCents: 4000, creditedCents: 6000 }, 0, 'paid'],
    [{ ...money, creditedCents: 2500 }, 7500, 'sent'],
    [{ ...money, paidCents: 10_000, refundedCents: 10_000 }, 10_000, 'sent'],
    [{ ...money, paidCents: 10_000, refundedCents: 1 }, 1, 'partly_paid'],
  ] as const)('%o → balance %d, %s', (m, balance, status) => {
    expect(invoiceBalanceCents(m)).toBe(balance);
    expect(settledStatus('sent', m)).toBe(status);
  });

  it('draft and void keep their status', () => {
    expect(settledStatus('draft', { ...money, paidCents: 10_000 })).toBe('draft');
    expect(settledStatus('void', money)).toBe('void');
  });

  it('overdue the day after the due day, as of a given day', () => {
    expect(invoiceStatusOn('sent', '2026-03-14', '2026-03-14')).toBe('sent');
    expect(invoiceStatusOn('sent', '2026-03-14', '2026-03-15')).toBe('overdue');
    expect(invoiceStatusOn('partly_paid', '2026-03-14', '2026-04-01')).toBe('overdue');
    expect(invoiceStatusOn('paid', '2026-03-14', '2026-04-01')).toBe('paid');
    expect(invoiceStatusOn('draft', '2026-03-14', '2026-04-01')).toBe('draft');
    expect(invoiceStatusOn('void', '2026-03-14', '2026-04-01')).toBe('void');
  });
});
