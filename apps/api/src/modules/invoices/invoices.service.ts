// The invoices module's service: what the handlers call.
import { localDateOf } from '@seamwright/domain';
import type {
  CreateInvoiceData,
  InvoiceListQuery,
  InvoiceSummaryView,
  ListResponse,
  PublicInvoiceView,
  RecordPaymentData,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { ServiceDeps } from '../../deps.js';
import { findOwnCompany } from '../company/company.repository.js';
import { renderInvoicePdf } from '../estimate-document/index.js';
import { createInvoice } from './invoice-create.service.js';
import { getInvoiceDocument, toInvoiceDocumentInput } from './invoice-document-input.js';
import {
  createInvoiceCreditNote,
  recordManualPayment,
  voidInvoice,
} from './invoice-payments.service.js';
import { getInvoiceView } from './invoice-read.js';
import { createInvoiceSendService } from './invoice-send.service.js';
import { toInvoiceSummary } from './invoice-view.js';
import { listInvoices } from './invoices.repository.js';
import { findInvoiceByToken, toPublicInvoiceView } from './public-invoices.service.js';

/** The invoice's PDF as the customer gets it (the checkout and reminders attach it too). */
export async function renderInvoicePdfFor(ctx: RequestContext, invoiceId: string) {
  const doc = await getInvoiceDocument(ctx, invoiceId);
  const pdf = await renderInvoicePdf(toInvoiceDocumentInput(doc));
  return { pdf, filename: `invoice-${doc.invoice.reference}.pdf` };
}

export function createInvoicesService(deps: ServiceDeps) {
  const { sequelize } = deps;
  const sending = createInvoiceSendService(deps);
  return {
    create: (ctx: RequestContext, input: CreateInvoiceData) => createInvoice(ctx, sequelize, input),
    async list(
      ctx: RequestContext,
      query: InvoiceListQuery,
    ): Promise<ListResponse<InvoiceSummaryView>> {
      // The company row is read for its time zone, in parallel with nothing: the day decides
      // which invoices are overdue, so it must be known before the page is read.
      const company = await findOwnCompany(ctx);
      const today = localDateOf(new Date(), company?.timeZone ?? 'UTC');
      const { rows, total } = await listInvoices(ctx, query, today);
      return {
        data: rows.map((row) => toInvoiceSummary(row, today)),
        meta: { page: query.page, pageSize: query.pageSize, total },
      };
    },
    get: getInvoiceView,
    send: sending.send,
    pdf: renderInvoicePdfFor,
    async recordPayment(ctx: RequestContext, id: string, input: RecordPaymentData) {
      await recordManualPayment(ctx, sequelize, id, input);
      return getInvoiceView(ctx, id);
    },
    async void(ctx: RequestContext, id: string, reason: string) {
      await voidInvoice(ctx, sequelize, id, reason);
      return getInvoiceView(ctx, id);
    },
    async creditNote(
      ctx: RequestContext,
      id: string,
      input: { amountCents: number; reason: string },
    ) {
      await createInvoiceCreditNote(ctx, sequelize, id, input);
      return getInvoiceView(ctx, id);
    },
    async publicView(token: string): Promise<PublicInvoiceView> {
      const found = await findInvoiceByToken(token);
      return toPublicInvoiceView(found.document);
    },
  };
}
