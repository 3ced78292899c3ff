// An invoice's status and balance, derived from what is stored. `overdue` is never stored:
// it depends on the day it is read (in the company's time zone), like an expired locate ticket.
import type { CalendarDate } from '../calendar/calendar.js';

export const invoiceStatuses = ['draft', 'sent', 'partly_paid', 'paid', 'overdue', 'void'] as const;
export type InvoiceStatus = (typeof invoiceStatuses)[number];
/** What the row keeps; `overdue` is added on reading. */
export type StoredInvoiceStatus = Exclude<InvoiceStatus, 'overdue'>;

export interface InvoiceMoney {
  totalCents: number;
  /** Payments received (manual and by card). */
  paidCents: number;
  /** Paid back to the customer (refunds, recorded later through the processor). */
  refundedCents: number;
  /** Credit notes written against the invoice. */
  creditedCents: number;
}

/** total − payments + refunds − credits (common practice, no published source). */
export function invoiceBalanceCents(money: InvoiceMoney): number {
  return money.totalCents - money.paidCents + money.refundedCents - money.creditedCents;
}

/**
 * The stored status after a payment, refund or credit: paid once nothing is owed, partly paid
 * once money came in, else sent. A draft or a void invoice keeps its status.
 */
export function settledStatus(
  current: StoredInvoiceStatus,
  money: InvoiceMoney,
): StoredInvoiceStatus {
  if (current === 'draft' || current === 'void') return current;
  if (invoiceBalanceCents(money) <= 0) return 'paid';
  return money.paidCents - money.refundedCents > 0 ? 'partly_paid' : 'sent';
}

/** The status shown on `asOf`: sent or partly paid and past the due day → overdue. */
export function invoiceStatusOn(
  stored: StoredInvoiceStatus,
  dueDate: CalendarDate,
  asOf: CalendarDate,
): InvoiceStatus {
  if ((stored === 'sent' || stored === 'partly_paid') && asOf > dueDate) return 'overdue';
  return stored;
}
