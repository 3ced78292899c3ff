// What each kind of invoice bills, from the accepted estimate and the job's earlier invoices.
//
// - deposit: one untaxed line, the accepted estimate's deposit (the deposit is part of the
//   estimate's total, tax included, so it is not taxed again).
// - progress: the lines typed by the office, taxed at the company rate.
// - final: the accepted total (tax included, untaxed line), plus the approved change lines
//   (taxed at the company rate), less every earlier invoice of the job that is not void, at its
//   invoiced total. Credit notes are not deducted here: a credit note already lowers the
//   balance of the invoice it is written against, and deducting it again would count it twice.
//   So final + earlier invoices = accepted total + changes, exactly.
import { MoneyInputError } from '../estimates/money.js';
import { invoiceTotalsOf, priceInvoiceLine } from './invoice-money.js';
import type { InvoiceKind, InvoiceLine, InvoiceLineInput, InvoiceTotals } from './invoice-money.js';

export interface AcceptedEstimateSummary {
  /** Printed on the lines, e.g. `E-1a2b3c4d v2`. */
  reference: string;
  /** The chosen tier's total, tax included. */
  totalCents: number;
  /** The chosen tier's deposit (part of the total). */
  depositCents: number;
}

export interface EarlierInvoice {
  /** Printed on the deduction line, e.g. `INV-000012`. */
  reference: string;
  kind: InvoiceKind;
  totalCents: number;
}

export interface InvoicePlanInput {
  kind: InvoiceKind;
  estimate: AcceptedEstimateSummary | null;
  /** Progress lines, or the approved change lines of a final invoice. */
  lines: readonly InvoiceLineInput[];
  /** The job's earlier invoices that are not void. */
  earlier: readonly EarlierInvoice[];
  taxRateBasisPoints: number;
}

export type InvoicePlan = InvoiceTotals & { lines: InvoiceLine[] };

export class InvoicePlanError extends Error {
  constructor(
    readonly path: string,
    readonly reason: 'no-accepted-estimate' | 'lines-required' | 'below-zero' | 'no-lines-allowed',
    message: string,
  ) {
    super(message);
    this.name = 'InvoicePlanError';
  }
}

function requireEstimate(input: InvoicePlanInput): AcceptedEstimateSummary {
  if (input.estimate) return input.estimate;
  throw new InvoicePlanError(
    'jobId',
    'no-accepted-estimate',
    `A ${input.kind} invoice needs an accepted estimate on the job`,
  );
}

function planLines(input: InvoicePlanInput): InvoiceLineInput[] {
  if (input.kind === 'deposit') {
    const estimate = requireEstimate(input);
    if (input.lines.length > 0)
      throw new InvoicePlanError(
        'lines',
        'no-lines-allowed',
        'A deposit invoice bills the accepted estimate’s deposit; it takes no lines',
      );
    return [
      {
        label: `Deposit on estimate ${estimate.reference}`,
        quantity: 1,
        unit: 'each',
        unitPriceCents: estimate.depositCents,
        taxable: false,
      },
    ];
  }
  if (input.kind === 'progress') {
    if (input.lines.length === 0)
      throw new InvoicePlanError('lines', 'lines-required', 'A progress invoice needs lines');
    return [...input.lines];
  }
  const estimate = requireEstimate(input);
  return [
    {
      label: `Work as accepted, estimate ${estimate.reference} (tax included)`,
      quantity: 1,
      unit: 'each',
      unitPriceCents: estimate.totalCents,
      taxable: false,
    },
    ...input.lines,
    ...input.earlier.map((invoice) => ({
      label: `Less ${invoice.kind} invoice ${invoice.reference}`,
      quantity: 1,
      unit: 'each',
      unitPriceCents: -invoice.totalCents,
      taxable: false,
    })),
  ];
}

/** The lines and totals of a new invoice; InvoicePlanError (naming the field) when it cannot be. */
export function planInvoice(input: InvoicePlanInput): InvoicePlan {
  for (const [index, line] of input.lines.entries())
    if (line.unitPriceCents < 0)
      throw new MoneyInputError(`lines.${index}.unitPriceCents`, 'must be at least 0');
  const lines = planLines(input).map(priceInvoiceLine);
  const totals = invoiceTotalsOf(lines, input.taxRateBasisPoints);
  if (totals.totalCents < 0)
    throw new InvoicePlanError(
      'kind',
      'below-zero',
      'The earlier invoices already bill more than the accepted total and changes: write a credit note instead',
    );
  return { ...totals, lines };
}
