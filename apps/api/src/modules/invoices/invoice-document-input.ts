// Everything the invoice PDF and the customer's pay page show, read in one place, and the
// adapter to the document module's plain input.
import { INVOICE_ROUNDING_RULE } from '@seamwright/domain';
import type { InvoiceView, PaymentMethod } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import type { InvoiceDocumentInput } from '../estimate-document/index.js';
import { siteAddress } from '../estimates/estimate-document-input.js';
import { findJob } from '../jobs/jobs.repository.js';
import { findSite } from '../sites/sites.repository.js';
import { getInvoiceView } from './invoice-read.js';

export interface InvoiceDocument {
  company: { name: string; address: string | null; timeZone: string; currency: string };
  customer: { name: string; email: string | null; billingAddress: string | null };
  siteAddress: string;
  invoice: InvoiceView;
}

/** 404 for another company's invoice. */
export async function getInvoiceDocument(
  ctx: RequestContext,
  invoiceId: string,
): Promise<InvoiceDocument> {
  const invoice = await getInvoiceView(ctx, invoiceId);
  const [company, customer, jobSite] = await Promise.all([
    findOwnCompany(ctx),
    findCustomer(ctx, invoice.customerId),
    siteOfJob(ctx, invoice.jobId),
  ]);
  if (!company || !customer) throw notFound('Invoice');
  return {
    company: {
      name: company.name,
      address: company.address,
      timeZone: company.timeZone,
      currency: company.currency,
    },
    customer: {
      name: customer.name,
      email: customer.email,
      billingAddress: customer.billingAddress,
    },
    siteAddress: jobSite,
    invoice,
  };
}

async function siteOfJob(ctx: RequestContext, jobId: string): Promise<string> {
  const job = await findJob(ctx, jobId);
  const site = job ? await findSite(ctx, job.siteId) : null;
  return site ? siteAddress(site) : '';
}

const titles = { deposit: 'Deposit invoice', progress: 'Progress invoice', final: 'Invoice' };
const methodLabels: Record<PaymentMethod, string> = {
  cheque: 'cheque',
  bank_transfer: 'bank transfer',
  cash: 'cash',
  card: 'card',
};

/** `825` → `8.25 %`. */
function percentOf(basisPoints: number): string {
  const whole = Math.trunc(basisPoints / 100);
  const rest = String(basisPoints % 100).padStart(2, '0');
  return `${whole}${rest === '00' ? '' : `.${rest.replace(/0$/, '')}`} %`;
}

export function toInvoiceDocumentInput(doc: InvoiceDocument): InvoiceDocumentInput {
  const { invoice } = doc;
  return {
    company: { name: doc.company.name, address: doc.company.address, phone: null, email: null },
    customer: doc.customer,
    siteAddress: doc.siteAddress,
    jobTitle: invoice.jobTitle,
    reference: invoice.reference,
    title: titles[invoice.kind],
    status: invoice.status,
    issuedOn: invoice.issuedOn,
    dueDate: invoice.dueDate,
    currency: invoice.currency,
    lines: invoice.lines.map((l) => ({
      label: l.label,
      quantity: l.quantity,
      unit: l.unit,
      unitPriceCents: l.unitPriceCents,
      amountCents: l.amountCents,
    })),
    subtotalCents: invoice.subtotalCents,
    taxCents: invoice.taxCents,
    taxLabel: `Tax (${percentOf(invoice.taxRateBasisPoints)} on taxable lines)`,
    totalCents: invoice.totalCents,
    payments: invoice.payments.map((p) => ({
      receivedOn: p.receivedOn,
      method: methodLabels[p.method],
      amountCents: p.amountCents - p.refundedCents,
    })),
    credits: invoice.creditNotes.map((c) => ({
      label: `${c.reference}: ${c.reason}`,
      amountCents: c.amountCents,
    })),
    balanceCents: invoice.balanceCents,
    notes: invoice.notes,
    roundingRule: INVOICE_ROUNDING_RULE.sentence,
  };
}
