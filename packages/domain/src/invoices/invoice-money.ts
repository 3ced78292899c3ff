// Invoice arithmetic: integer cents throughout, the same rounding as estimates (the line
// products and the tax share go through the estimates' BigInt helpers), so an invoice made
// from an estimate can never round differently from it.
import { basisPointsOf, lineAmountCents, MoneyInputError } from '../estimates/money.js';

/**
 * How invoices round, in one place (the invoice PDF's small print quotes `sentence`). The
 * rules are those of ESTIMATE_ROUNDING_RULE: half-up to the cent per line, tax once on the
 * taxable subtotal, half-up to the cent (common practice, no published source).
 */
export const INVOICE_ROUNDING_RULE = {
  lineRounding: 'half-up to the cent, per line (half away from zero for deductions)',
  tax: 'once, on the taxable subtotal, half-up to the cent',
  sentence:
    'Each line (quantity × unit price) is rounded half-up to the cent; tax is computed once on ' +
    'the taxable subtotal at the company rate and rounded half-up to the cent, as on the ' +
    'estimate; amounts already invoiced are deducted at their invoiced totals, tax included; ' +
    'the balance is the total less payments and credit notes.',
} as const;

export const invoiceKinds = ['deposit', 'progress', 'final'] as const;
export type InvoiceKind = (typeof invoiceKinds)[number];

export interface InvoiceLineInput {
  label: string;
  quantity: number;
  unit: string;
  /** Negative for a deduction (an amount already invoiced); whole cents. */
  unitPriceCents: number;
  taxable: boolean;
}

export interface InvoiceLine extends InvoiceLineInput {
  amountCents: number;
}

export interface InvoiceTotals {
  subtotalCents: number;
  taxableSubtotalCents: number;
  taxCents: number;
  /** Subtotal plus tax. */
  totalCents: number;
}

/** quantity × unit price, half-up to the cent; a negative price rounds half away from zero. */
export function priceInvoiceLine(line: InvoiceLineInput): InvoiceLine {
  if (!Number.isSafeInteger(line.unitPriceCents))
    throw new MoneyInputError('unitPriceCents', 'must be a whole number of cents');
  const magnitude = lineAmountCents(line.quantity, Math.abs(line.unitPriceCents));
  const amountCents = line.unitPriceCents < 0 ? -magnitude : magnitude;
  return { ...line, amountCents };
}

/**
 * Lines summed, tax once on the taxable part. A taxable subtotal below zero (taxable
 * deductions larger than the taxable work) is refused: a negative tax is a credit note's job.
 */
export function invoiceTotalsOf(
  lines: readonly InvoiceLine[],
  taxRateBasisPoints: number,
): InvoiceTotals {
  let subtotal = 0n;
  let taxable = 0n;
  for (const line of lines) {
    subtotal += BigInt(line.amountCents);
    if (line.taxable) taxable += BigInt(line.amountCents);
  }
  if (taxable < 0n) throw new MoneyInputError('lines', 'the taxable lines add up to less than 0');
  const taxableSubtotalCents = safe(taxable, 'lines');
  const taxCents = basisPointsOf(taxableSubtotalCents, taxRateBasisPoints, 'taxRateBasisPoints');
  const subtotalCents = safe(subtotal, 'lines');
  return {
    subtotalCents,
    taxableSubtotalCents,
    taxCents,
    totalCents: safe(subtotal + BigInt(taxCents), 'lines'),
  };
}

function safe(value: bigint, path: string): number {
  const out = Number(value);
  if (!Number.isSafeInteger(out)) throw new MoneyInputError(path, 'amount is too large');
  return out;
}
