// What the customer statement prints, as plain data (it crosses into the worker thread by
// structured cloning). Built by the receivables module from the customer's owing invoices.
import type { DocumentDate, EstimateDocumentCompany } from './estimate-document.types.js';

export interface StatementDocumentEntry {
  date: DocumentDate;
  /** `Invoice INV-000042 (due 30 Apr 2026)`, `Payment on INV-000042 (Cheque)`, `Credit CN-000003`. */
  label: string;
  /** What the entry adds to the balance (an invoice), else 0. */
  chargeCents: number;
  /** What it takes off (a payment net of refunds, a credit note), else 0. */
  creditCents: number;
  /** The running balance after this entry. */
  balanceCents: number;
}

export interface StatementDocumentInput {
  company: EstimateDocumentCompany;
  customer: { name: string; email: string | null; billingAddress: string | null };
  issuedOn: DocumentDate;
  currency: string;
  entries: StatementDocumentEntry[];
  /** The customer's aging, in the report's bucket order. */
  aging: { label: string; cents: number }[];
  balanceCents: number;
}
