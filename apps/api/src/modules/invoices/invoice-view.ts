// Rows → the API's views. The status shown is derived on the company's local day (overdue).
import { invoiceBalanceCents, invoiceStatusOn } from '@seamwright/domain';
import type { StoredInvoiceStatus } from '@seamwright/domain';
import type {
  CreditNoteView,
  InvoiceKind,
  InvoiceLinkView,
  InvoiceSummaryView,
  PaymentMethod,
  PaymentView,
} from '@seamwright/shared';
import type { CreditNoteRow, InvoiceLinkRow, PaymentRow } from './invoice-money.repository.js';
import type { InvoiceRow } from './invoices.repository.js';

/** As printed: `INV-000042`. */
export function invoiceReference(number: number): string {
  return `INV-${String(number).padStart(6, '0')}`;
}

export function creditNoteReference(number: number): string {
  return `CN-${String(number).padStart(6, '0')}`;
}

export function balanceOf(row: InvoiceRow): number {
  return invoiceBalanceCents(row);
}

export function toInvoiceSummary(
  row: InvoiceRow & { customer?: { name: string } },
  today: string,
): InvoiceSummaryView {
  return {
    id: row.id,
    number: row.number,
    reference: invoiceReference(row.number),
    kind: row.kind as InvoiceKind,
    status: invoiceStatusOn(row.status as StoredInvoiceStatus, row.dueDate, today),
    jobId: row.jobId,
    customerId: row.customerId,
    customerName: row.customer?.name ?? '',
    issuedOn: row.issuedOn,
    dueDate: row.dueDate,
    currency: row.currency,
    subtotalCents: row.subtotalCents,
    taxCents: row.taxCents,
    totalCents: row.totalCents,
    paidCents: row.paidCents,
    refundedCents: row.refundedCents,
    creditedCents: row.creditedCents,
    balanceCents: balanceOf(row),
    sentAt: row.sentAt?.toISOString() ?? null,
    voidedAt: row.voidedAt?.toISOString() ?? null,
    voidReason: row.voidReason,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toPaymentView(row: PaymentRow): PaymentView {
  return {
    id: row.id,
    method: row.method as PaymentMethod,
    amountCents: row.amountCents,
    refundedCents: row.refundedCents,
    receivedOn: row.receivedOn,
    reference: row.reference,
    processorPaymentIntentId: row.processorPaymentIntentId,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toCreditNoteView(row: CreditNoteRow): CreditNoteView {
  return {
    id: row.id,
    number: row.number,
    reference: creditNoteReference(row.number),
    amountCents: row.amountCents,
    reason: row.reason,
    issuedOn: row.issuedOn,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toLinkView(row: InvoiceLinkRow): InvoiceLinkView {
  return {
    id: row.id,
    expiresAt: row.expiresAt.toISOString(),
    revokedAt: row.revokedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}
