// Reading one invoice whole (lines, payments, credit notes, links), and the company's day.
import { localDateOf } from '@seamwright/domain';
import type { InvoiceView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findJob } from '../jobs/jobs.repository.js';
import {
  listCreditNotesOfInvoice,
  listLinksOfInvoice,
  listPaymentsOfInvoice,
} from './invoice-money.repository.js';
import { toCreditNoteView, toInvoiceSummary, toLinkView, toPaymentView } from './invoice-view.js';
import { findInvoice, listLinesOfInvoice } from './invoices.repository.js';

/** Today in the company's time zone: due days and overdue are calendar days there. */
export async function companyToday(ctx: RequestContext, now = new Date()): Promise<string> {
  const company = await findOwnCompany(ctx);
  return localDateOf(now, company?.timeZone ?? 'UTC');
}

/** 404 for another company's invoice. */
export async function getInvoiceView(ctx: RequestContext, id: string): Promise<InvoiceView> {
  const [invoice, company, lines, payments, credits, links] = await Promise.all([
    findInvoice(ctx, id),
    findOwnCompany(ctx),
    listLinesOfInvoice(ctx, id),
    listPaymentsOfInvoice(ctx, id),
    listCreditNotesOfInvoice(ctx, id),
    listLinksOfInvoice(ctx, id),
  ]);
  if (!invoice || !company) throw notFound('Invoice');
  const job = await findJob(ctx, invoice.jobId);
  const today = localDateOf(new Date(), company.timeZone);
  return {
    ...toInvoiceSummary(invoice, today),
    estimateId: invoice.estimateId,
    taxRateBasisPoints: invoice.taxRateBasisPoints,
    notes: invoice.notes,
    jobTitle: job?.title ?? '',
    lines: lines.map((l) => ({
      label: l.label,
      quantity: l.quantity,
      unit: l.unit,
      unitPriceCents: l.unitPriceCents,
      amountCents: l.amountCents,
      taxable: l.taxable,
    })),
    payments: payments.map(toPaymentView),
    creditNotes: credits.map(toCreditNoteView),
    links: links.map(toLinkView),
  };
}
