// Invoices, payments and credit notes: request schemas and the views the API answers with.
import { invoiceKinds, invoiceStatuses } from '@seamwright/domain';
import type { InvoiceKind, InvoiceStatus } from '@seamwright/domain';
import { z } from 'zod';
import { pageQuerySchema } from './list.js';

export { invoiceKinds, invoiceStatuses };
export type { InvoiceKind, InvoiceStatus };

const isoDate = z.iso.date({ error: 'Use a date like 2026-04-30' });
const cents = (what: string) =>
  z
    .number({ error: `${what} must be a whole number of cents` })
    .int(`${what} must be a whole number of cents`)
    .safe();

export const invoiceLineInputSchema = z.object({
  label: z.string().trim().min(1, 'Describe the line').max(300),
  quantity: z.number().min(0, 'The quantity must be at least 0').max(1_000_000),
  unit: z.string().trim().min(1).max(30).default('each'),
  unitPriceCents: cents('The unit price').min(0, 'The unit price must be at least 0'),
  taxable: z.boolean().default(true),
});
export type InvoiceLineData = z.output<typeof invoiceLineInputSchema>;

export const createInvoiceInputSchema = z.object({
  jobId: z.uuid({ error: 'Choose a job' }),
  kind: z.enum(invoiceKinds, { error: 'The kind is deposit, progress or final' }),
  lines: z.array(invoiceLineInputSchema).max(200).default([]),
  notes: z.string().trim().max(5000).nullish(),
});
export type CreateInvoiceData = z.output<typeof createInvoiceInputSchema>;

/** `status=sent&status=overdue` or `status=sent,overdue`; empty means every status. */
const statusFilter = z
  .union([z.string(), z.array(z.string())])
  .optional()
  .transform((raw) =>
    (Array.isArray(raw) ? raw : raw ? [raw] : []).flatMap((s) => s.split(',')).filter(Boolean),
  )
  .pipe(z.array(z.enum(invoiceStatuses, { error: 'Unknown invoice status' })));

export const invoiceListQuerySchema = pageQuerySchema.extend({
  status: statusFilter,
  customerId: z.uuid({ error: 'Not a customer id' }).optional(),
  jobId: z.uuid({ error: 'Not a job id' }).optional(),
});
export type InvoiceListQuery = z.output<typeof invoiceListQuerySchema>;

export const paymentMethods = ['cheque', 'bank_transfer', 'cash', 'card'] as const;
export type PaymentMethod = (typeof paymentMethods)[number];
/** What the office records by hand; card payments come from the processor. */
export const manualPaymentMethods = ['cheque', 'bank_transfer', 'cash'] as const;

export const recordPaymentInputSchema = z.object({
  amountCents: cents('The amount').min(1, 'The amount must be more than 0'),
  method: z.enum(manualPaymentMethods, { error: 'The method is cheque, bank_transfer or cash' }),
  receivedOn: isoDate,
  reference: z.string().trim().max(200).nullish(),
});
export type RecordPaymentData = z.output<typeof recordPaymentInputSchema>;

export const voidInvoiceInputSchema = z.object({
  reason: z.string().trim().min(1, 'Say why the invoice is void').max(500),
});

export const createCreditNoteInputSchema = z.object({
  amountCents: cents('The amount').min(1, 'The amount must be more than 0'),
  reason: z.string().trim().min(1, 'Say why the credit is given').max(500),
});

export const sendInvoiceInputSchema = z.object({
  to: z.email({ error: 'Enter a valid e-mail address' }).optional(),
});

export interface InvoiceLineView {
  label: string;
  quantity: number;
  unit: string;
  unitPriceCents: number;
  amountCents: number;
  taxable: boolean;
}

export interface PaymentView {
  id: string;
  method: PaymentMethod;
  amountCents: number;
  refundedCents: number;
  receivedOn: string;
  reference: string | null;
  processorPaymentIntentId: string | null;
  createdAt: string;
}

export interface CreditNoteView {
  id: string;
  number: number;
  reference: string;
  amountCents: number;
  reason: string;
  issuedOn: string;
  createdAt: string;
}

export interface InvoiceLinkView {
  id: string;
  expiresAt: string;
  revokedAt: string | null;
  createdAt: string;
}

export interface InvoiceSummaryView {
  id: string;
  /** Gapless per company, from 1. */
  number: number;
  /** As printed: `INV-000042`. */
  reference: string;
  kind: InvoiceKind;
  status: InvoiceStatus;
  jobId: string;
  customerId: string;
  customerName: string;
  issuedOn: string;
  dueDate: string;
  currency: string;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  paidCents: number;
  refundedCents: number;
  creditedCents: number;
  balanceCents: number;
  sentAt: string | null;
  voidedAt: string | null;
  voidReason: string | null;
  createdAt: string;
}

export interface InvoiceView extends InvoiceSummaryView {
  estimateId: string | null;
  taxRateBasisPoints: number;
  notes: string | null;
  jobTitle: string;
  lines: InvoiceLineView[];
  payments: PaymentView[];
  creditNotes: CreditNoteView[];
  links: InvoiceLinkView[];
}

/** What the customer's pay page shows (no session). */
export interface PublicInvoiceView {
  company: { name: string; address: string | null; phone: string | null; email: string | null };
  customer: { name: string };
  jobTitle: string;
  siteAddress: string;
  number: number;
  reference: string;
  kind: InvoiceKind;
  status: InvoiceStatus;
  issuedOn: string;
  dueDate: string;
  currency: string;
  lines: Omit<InvoiceLineView, 'taxable'>[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  paidCents: number;
  creditedCents: number;
  balanceCents: number;
  roundingRule: string;
}
