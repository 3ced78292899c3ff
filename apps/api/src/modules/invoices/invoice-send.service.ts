// Sending an invoice: in one transaction a draft is issued (its issue and due days become
// today and today + the company's terms) and marked sent, and a new private pay link is stored
// (only its SHA-256); sending the final invoice of an installed job makes it invoiced. After
// commit, the e-mail with the PDF attached and the link `${APP_URL}/i/<token>`.
import {
  addCalendarDays,
  localDateOf,
  longCalendarDate,
  startOfLocalDay,
} from '@seamwright/domain';
import type { InvoiceView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { createOneTimeToken } from '../../tokens.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { scheduleRemindersOnSend } from '../reminders/reminder-hooks.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import { formatMoney, renderInvoicePdf } from '../estimate-document/index.js';
import { getInvoiceDocument, toInvoiceDocumentInput } from './invoice-document-input.js';
import { moveJobForInvoice } from './invoice-job-moves.js';
import { invoiceMail } from './invoice-mail.js';
import { createInvoiceLink } from './invoice-money.repository.js';
import { getInvoiceView } from './invoice-read.js';
import { invoiceReference } from './invoice-view.js';
import { findInvoice, lockInvoice, updateInvoice } from './invoices.repository.js';

/** The customer's pay page for a link; the web app serves it. */
export function invoicePageUrl(appUrl: string, token: string): string {
  return `${appUrl}/i/${token}`;
}

/**
 * A pay link works until local midnight 180 days after the due day: a late payer must still be
 * able to pay, and a reminder sends a fresh link anyway (our choice, no published source).
 */
export const INVOICE_LINK_DAYS_AFTER_DUE = 180;

export function createInvoiceSendService({ sequelize, mailer, logger, env }: ServiceDeps) {
  async function send(
    ctx: RequestContext,
    invoiceId: string,
    input: { to?: string | undefined },
  ): Promise<InvoiceView> {
    const [current, company] = await Promise.all([
      findInvoice(ctx, invoiceId),
      findOwnCompany(ctx),
    ]);
    if (!current || !company) throw notFound('Invoice');
    const customer = await findCustomer(ctx, current.customerId);
    const to = input.to ?? customer?.email ?? null;
    if (!to) {
      const message = 'The customer has no e-mail address: give one to send to';
      throw new AppError('VALIDATION_FAILED', `to: ${message}`, {
        errors: [{ path: 'to', message }],
      });
    }
    const now = new Date();
    const today = localDateOf(now, company.timeZone);
    const { token, tokenHash } = createOneTimeToken();
    await inTransaction(sequelize, async (tx) => {
      const invoice = await lockInvoice(ctx, invoiceId, tx);
      if (!invoice) throw notFound('Invoice');
      if (invoice.status === 'void') {
        const message = 'The invoice is void: it cannot be sent';
        throw new AppError('CONFLICT', `status: ${message}`, {
          errors: [{ path: 'status', message }],
        });
      }
      const first = invoice.status === 'draft';
      const dueDate = first ? addCalendarDays(today, company.invoiceDueDays) : invoice.dueDate;
      if (first)
        await updateInvoice(
          ctx,
          invoiceId,
          { status: 'sent', sentAt: now, issuedOn: today, dueDate },
          tx,
        );
      if (first) await scheduleRemindersOnSend(ctx, { id: invoiceId, dueDate, sentOn: today }, tx);
      const expiresAt = startOfLocalDay(
        addCalendarDays(dueDate, INVOICE_LINK_DAYS_AFTER_DUE + 1),
        company.timeZone,
      );
      await createInvoiceLink(ctx, { invoiceId, tokenHash, expiresAt }, tx);
      if (invoice.kind === 'final')
        await moveJobForInvoice(
          ctx,
          invoice.jobId,
          'invoiced',
          { invoiceId, userId: ctx.userId },
          tx,
        );
      await recordAuditEvent(
        ctx,
        {
          action: 'job.invoice_emailed',
          entity: 'job',
          entityId: invoice.jobId,
          data: {
            invoiceId,
            number: invoice.number,
            to,
            first,
            linkExpiresAt: expiresAt.toISOString(),
          },
        },
        tx,
      );
    });
    // After commit: the PDF shows the invoice as sent; a failed e-mail never undoes the link.
    const doc = await getInvoiceDocument(ctx, invoiceId);
    const pdf = await renderInvoicePdf(toInvoiceDocumentInput(doc));
    const reference = invoiceReference(doc.invoice.number);
    const content = invoiceMail({
      companyName: doc.company.name,
      customerName: doc.customer.name,
      reference,
      jobTitle: doc.invoice.jobTitle,
      amountText: formatMoney(doc.invoice.balanceCents, doc.invoice.currency),
      dueText: longCalendarDate(doc.invoice.dueDate),
      link: invoicePageUrl(env.appUrl, token),
    });
    try {
      await mailer.send({
        to,
        ...content,
        attachments: [
          { filename: `invoice-${reference}.pdf`, content: pdf, contentType: 'application/pdf' },
        ],
      });
    } catch (error) {
      logger.error({ err: error, invoiceId }, 'invoice e-mail could not be sent');
      throw new AppError(
        'SERVICE_BUSY',
        'The invoice is marked sent, but the e-mail could not be sent: try sending again',
        { headers: { 'Retry-After': '60' } },
      );
    }
    return getInvoiceView(ctx, invoiceId);
  }

  return { send };
}
