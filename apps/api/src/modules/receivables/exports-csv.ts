// The accountant's CSV files (papaparse `unparse`). Amounts are decimal strings in currency
// units with exactly 2 places and a leading `-` when negative (`1234.50`, `-12.00`), made from
// integer cents by string arithmetic, never through a float. The balance and the status shown
// come from the invoices module's own functions, so the file and the API agree to the cent.
import Papa from 'papaparse';
import { invoiceBalanceCents, invoiceStatusOn } from '@seamwright/domain';
import type { StoredInvoiceStatus } from '@seamwright/domain';
import { invoiceReference } from '../invoices/invoice-view.js';
import type { InvoiceExportRow, PaymentExportRow } from './exports.repository.js';

/** Integer cents → `"-1234.05"`. */
export function centsToDecimal(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const digits = String(Math.abs(cents)).padStart(3, '0');
  return `${sign}${digits.slice(0, -2)}.${digits.slice(-2)}`;
}

export const invoiceCsvColumns = [
  'invoice',
  'kind',
  'status',
  'issuedOn',
  'dueDate',
  'customer',
  'currency',
  'subtotal',
  'tax',
  'total',
  'paid',
  'refunded',
  'credited',
  'balance',
] as const;

export const paymentCsvColumns = [
  'receivedOn',
  'invoice',
  'customer',
  'method',
  'reference',
  'currency',
  'amount',
  'refunded',
  'net',
] as const;

// escapeFormulae: a customer called "=SUM(…)" must not become a formula in a spreadsheet.
const csvOptions = { newline: '\r\n', escapeFormulae: true } as const;

export function invoicesCsv(rows: readonly InvoiceExportRow[], today: string): string {
  const records = rows.map((r) => ({
    invoice: invoiceReference(r.number),
    kind: r.kind,
    status: invoiceStatusOn(r.status as StoredInvoiceStatus, r.dueDate, today),
    issuedOn: r.issuedOn,
    dueDate: r.dueDate,
    customer: r.customerName,
    currency: r.currency,
    subtotal: centsToDecimal(r.subtotalCents),
    tax: centsToDecimal(r.taxCents),
    total: centsToDecimal(r.totalCents),
    paid: centsToDecimal(r.paidCents),
    refunded: centsToDecimal(r.refundedCents),
    credited: centsToDecimal(r.creditedCents),
    balance: centsToDecimal(invoiceBalanceCents(r)),
  }));
  return Papa.unparse(records, { ...csvOptions, columns: [...invoiceCsvColumns] });
}

export function paymentsCsv(rows: readonly PaymentExportRow[]): string {
  const records = rows.map((r) => ({
    receivedOn: r.receivedOn,
    invoice: invoiceReference(r.invoiceNumber),
    customer: r.customerName,
    method: r.method,
    reference: r.reference ?? '',
    currency: r.currency,
    amount: centsToDecimal(r.amountCents),
    refunded: centsToDecimal(r.refundedCents),
    net: centsToDecimal(r.amountCents - r.refundedCents),
  }));
  return Papa.unparse(records, { ...csvOptions, columns: [...paymentCsvColumns] });
}
