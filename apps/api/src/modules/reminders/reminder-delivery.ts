// Sends one reminder inside the caller's transaction, which holds the invoice's row lock:
// logs it (a scheduled step can be logged once only: unique key), makes a fresh pay link (only
// hashes are stored, so the link of the first e-mail cannot be rebuilt), renders the company's
// template and hands the mail to SMTP. The caller commits after; see reminder-worker.ts for
// what that order guarantees.
import {
  addCalendarDays,
  calendarDaysBetween,
  longCalendarDate,
  reminderKindOf,
  renderReminderTemplate,
  startOfLocalDay,
} from '@seamwright/domain';
import type { ReminderStep, ReminderTemplate, ReminderValues } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { createOneTimeToken } from '../../tokens.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import { formatMoney } from '../estimate-document/index.js';
import { createInvoiceLink } from '../invoices/invoice-money.repository.js';
import { INVOICE_LINK_DAYS_AFTER_DUE, invoicePageUrl } from '../invoices/invoice-send.service.js';
import { balanceOf, invoiceReference } from '../invoices/invoice-view.js';
import type { InvoiceRow } from '../invoices/invoices.repository.js';
import type { ReminderSettingsRecord } from './reminders.repository.js';
import { createReminderLog, updateReminderLog } from './reminders.repository.js';
import type { InvoiceReminderRow } from './reminders.repository.js';

type Deps = Pick<ServiceDeps, 'env' | 'mailer'>;

/**
 * The same Message-ID every time one invoice's step is sent, so a resend after a crash (see
 * reminder-worker.ts) is recognisable as the same message by mail clients and by us.
 */
export function reminderMessageId(appUrl: string, invoiceId: string, step: string): string {
  return `<reminder.${invoiceId}.${step}@${new URL(appUrl).hostname}>`;
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function bodyHtml(text: string): string {
  const paragraphs = text.split(/\n{2,}/).map((p) => escapeHtml(p).replace(/\n/g, '<br>'));
  return `<!doctype html><html><body style="font-family: sans-serif">${paragraphs
    .map((p) => `<p>${p}</p>`)
    .join('\n')}</body></html>`;
}

export interface DeliveryInput {
  kind: 'scheduled' | 'manual';
  /** The schedule step; null for a manual reminder. */
  step: ReminderStep | null;
  to: string | null;
  today: string;
  userId: string | null;
}

export async function deliverReminder(
  deps: Deps,
  ctx: RequestContext,
  invoice: InvoiceRow,
  settings: ReminderSettingsRecord,
  input: DeliveryInput,
  tx: Tx,
): Promise<InvoiceReminderRow> {
  // Not under tx: findOwnCompany(ctx, tx) would lock the company row and serialise workers.
  const [company, customer] = await Promise.all([
    findOwnCompany(ctx),
    findCustomer(ctx, invoice.customerId, tx),
  ]);
  const to = input.to ?? customer?.email ?? null;
  const base = {
    invoiceId: invoice.id,
    kind: input.kind,
    offsetDays: input.step?.offsetDays ?? null,
    dueOn: input.step?.dueOn ?? null,
    createdBy: input.userId,
  };
  if (!to || !company)
    // The step is logged as failed so the schedule moves on; the log shows why.
    return createReminderLog(
      ctx,
      {
        ...base,
        sentAt: null,
        messageId: null,
        toAddress: '',
        error: 'The customer has no e-mail address',
      },
      tx,
    );
  const log = await createReminderLog(
    ctx,
    { ...base, sentAt: null, messageId: null, toAddress: to, error: null },
    tx,
  );
  const messageId = reminderMessageId(
    deps.env.appUrl,
    invoice.id,
    input.step ? String(input.step.offsetDays) : `manual.${log.id}`,
  );
  const { token, tokenHash } = createOneTimeToken();
  const expiresAt = startOfLocalDay(
    addCalendarDays(invoice.dueDate, INVOICE_LINK_DAYS_AFTER_DUE + 1),
    company.timeZone,
  );
  await createInvoiceLink(ctx, { invoiceId: invoice.id, tokenHash, expiresAt }, tx);
  const values: ReminderValues = {
    customerName: customer?.name ?? '',
    invoiceNumber: invoiceReference(invoice.number),
    amountDue: formatMoney(balanceOf(invoice), invoice.currency),
    dueDate: longCalendarDate(invoice.dueDate),
    payLink: invoicePageUrl(deps.env.appUrl, token),
    companyName: company.name,
  };
  const offset = input.step?.offsetDays ?? calendarDaysBetween(invoice.dueDate, input.today);
  const template: ReminderTemplate = settings.templates[reminderKindOf(offset)];
  const text = renderReminderTemplate(template.body, values);
  await deps.mailer.send({
    to,
    subject: renderReminderTemplate(template.subject, values),
    text: `${text}\n`,
    html: bodyHtml(text),
    messageId,
    fromName: settings.senderName ?? company.name,
  });
  const sentAt = new Date();
  await updateReminderLog(ctx, log.id, { sentAt, messageId }, tx);
  return { ...log, sentAt, messageId };
}
