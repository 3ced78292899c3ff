// The reminder routes' work: the settings (GET/PUT), an invoice's log, and "send a reminder now".
import {
  localDateOf,
  remindableInvoiceStatuses,
  reminderScheduleProblem,
  reminderTemplateKinds,
  reminderTemplateProblem,
} from '@seamwright/domain';
import type {
  InvoiceReminderView,
  ReminderSettingsData,
  ReminderSettingsView,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { describeFieldErrors } from '../../http/validate.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findInvoice, lockInvoice } from '../invoices/invoices.repository.js';
import { deliverReminder } from './reminder-delivery.js';
import { computeNextReminderOn, isRemindable, sentOnOf } from './reminder-hooks.js';
import { effectiveReminderSettings, toReminderSettingsView } from './reminder-settings.js';
import type { InvoiceReminderRow, ReminderSettingsRecord } from './reminders.repository.js';
import {
  listRemindersOfInvoice,
  lockRemindableInvoices,
  saveReminderSettingsRow,
  setNextReminderOn,
} from './reminders.repository.js';

function toLogView(row: InvoiceReminderRow): InvoiceReminderView {
  return {
    id: row.id,
    kind: row.kind as InvoiceReminderView['kind'],
    offsetDays: row.offsetDays,
    dueOn: row.dueOn,
    sentAt: row.sentAt?.toISOString() ?? null,
    messageId: row.messageId,
    toAddress: row.toAddress,
    error: row.error,
  };
}

/** Every problem of the input at once, each naming its field. */
function settingsProblems(input: ReminderSettingsData): { path: string; message: string }[] {
  const errors: { path: string; message: string }[] = [];
  const schedule = reminderScheduleProblem(input.offsets);
  if (schedule) errors.push({ path: 'offsets', message: schedule });
  for (const kind of reminderTemplateKinds) {
    const template = input.templates[kind];
    if (!template) continue;
    for (const field of ['subject', 'body'] as const) {
      const problem = reminderTemplateProblem(template[field]);
      if (problem) errors.push({ path: `templates.${kind}.${field}`, message: problem });
    }
  }
  return errors;
}

function conflict(path: string, message: string): AppError {
  return new AppError('CONFLICT', `${path}: ${message}`, { errors: [{ path, message }] });
}

export function createRemindersService(deps: ServiceDeps) {
  const { sequelize, logger } = deps;

  async function getSettings(ctx: RequestContext): Promise<ReminderSettingsView> {
    return toReminderSettingsView(await effectiveReminderSettings(ctx));
  }

  async function putSettings(
    ctx: RequestContext,
    input: ReminderSettingsData,
  ): Promise<ReminderSettingsView> {
    const errors = settingsProblems(input);
    if (errors.length > 0)
      throw new AppError('VALIDATION_FAILED', describeFieldErrors(errors), { errors });
    const company = await findOwnCompany(ctx);
    const timeZone = company?.timeZone ?? 'UTC';
    const saved = await inTransaction(sequelize, async (tx) => {
      const current = await effectiveReminderSettings(ctx, { tx, lock: true });
      const next: ReminderSettingsRecord = {
        enabled: input.enabled,
        offsets: [...input.offsets].sort((a, b) => a - b),
        senderName: input.senderName ? input.senderName : null,
        templates: { ...current.templates, ...input.templates },
      };
      await saveReminderSettingsRow(ctx, current.id, next, tx);
      // The open invoices follow the new schedule at once (or stop, when switched off).
      for (const invoice of await lockRemindableInvoices(ctx, remindableInvoiceStatuses, tx)) {
        const day = await computeNextReminderOn(
          ctx,
          { id: invoice.id, dueDate: invoice.dueDate, sentOn: sentOnOf(invoice, timeZone) },
          next,
          tx,
        );
        if (day !== (invoice.nextReminderOn ?? null))
          await setNextReminderOn(ctx, invoice.id, day, tx);
      }
      await recordAuditEvent(
        ctx,
        {
          action: 'reminder_settings.updated',
          entity: 'reminder_settings',
          entityId: null,
          data: { enabled: next.enabled, offsets: next.offsets },
        },
        tx,
      );
      return next;
    });
    return toReminderSettingsView(saved);
  }

  async function listLog(ctx: RequestContext, invoiceId: string): Promise<InvoiceReminderView[]> {
    // In parallel: another company's invoice id finds no rows in either.
    const [invoice, rows] = await Promise.all([
      findInvoice(ctx, invoiceId),
      listRemindersOfInvoice(ctx, invoiceId),
    ]);
    if (!invoice) throw notFound('Invoice');
    return rows.map(toLogView);
  }

  /** A reminder sent by hand, logged with its message id; the schedule is left as it is. */
  async function sendNow(
    ctx: RequestContext,
    invoiceId: string,
    input: { to?: string | undefined },
  ): Promise<InvoiceReminderView> {
    const company = await findOwnCompany(ctx);
    const today = localDateOf(new Date(), company?.timeZone ?? 'UTC');
    // Not inTransaction(): it retries after a deadlock, and this work sends an e-mail.
    const tx = await sequelize.transaction();
    try {
      const invoice = await lockInvoice(ctx, invoiceId, tx);
      if (!invoice) throw notFound('Invoice');
      if (!isRemindable(invoice.status))
        throw conflict('status', `The invoice is ${invoice.status}: there is nothing to remind`);
      const settings = await effectiveReminderSettings(ctx, { tx });
      let row: InvoiceReminderRow;
      try {
        row = await deliverReminder(
          deps,
          ctx,
          invoice,
          settings,
          { kind: 'manual', step: null, to: input.to ?? null, today, userId: ctx.userId },
          tx,
        );
      } catch (error) {
        logger.error({ err: error, invoiceId }, 'reminder e-mail could not be sent');
        throw new AppError('SERVICE_BUSY', 'The reminder could not be sent: try again', {
          headers: { 'Retry-After': '60' },
        });
      }
      if (!row.sentAt)
        throw new AppError('VALIDATION_FAILED', `to: ${row.error ?? 'No address'}`, {
          errors: [{ path: 'to', message: row.error ?? 'No address' }],
        });
      await recordAuditEvent(
        ctx,
        {
          action: 'job.invoice_reminder_sent',
          entity: 'job',
          entityId: invoice.jobId,
          data: { invoiceId, reminderId: row.id, to: row.toAddress, messageId: row.messageId },
        },
        tx,
      );
      await tx.commit();
      return toLogView(row);
    } catch (error) {
      await tx.rollback().catch(() => undefined);
      throw error;
    }
  }

  return { getSettings, putSettings, listLog, sendNow };
}
