// What the invoice document prints, as plain data (it crosses into the worker thread by
// structured cloning). Joined to saved invoices by the invoices module's adapter.
import type {
  DocumentDate,
  EstimateDocumentCompany,
  EstimateDocumentLine,
} from './estimate-document.types.js';

export interface InvoiceDocumentPayment {
  receivedOn: DocumentDate;
  /** As it prints: `Cheque`, `Bank transfer`, `Card`. */
  method: string;
  amountCents: number;
}

export interface InvoiceDocumentInput {
  company: EstimateDocumentCompany;
  customer: { name: string; email: string | null; billingAddress: string | null };
  /** As it prints: several lines allowed. */
  siteAddress: string;
  jobTitle: string;
  /** `INV-000042`. */
  reference: string;
  /** `Deposit invoice`, `Progress invoice`, `Invoice`. */
  title: string;
  status: string;
  issuedOn: DocumentDate;
  dueDate: DocumentDate;
  currency: string;
  lines: EstimateDocumentLine[];
  subtotalCents: number;
  taxCents: number;
  /** `Tax (8.25 %)`. */
  taxLabel: string;
  totalCents: number;
  payments: InvoiceDocumentPayment[];
  /** Credit notes, each as `CN-000003: reason` and its amount. */
  credits: { label: string; amountCents: number }[];
  balanceCents: number;
  notes: string | null;
  /** How tax and totals are rounded, as one sentence for the small print. */
  roundingRule: string;
}
