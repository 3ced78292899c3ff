// The one-call hooks the invoice services make so the worker knows when to look at an invoice:
// sending schedules the first step, settling (paid) and voiding stop the reminders. Each runs
// inside the caller's transaction, under its invoice lock.
import { localDateOf, nextReminderOn, remindableInvoiceStatuses } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { findOwnCompany } from '../company/company.repository.js';
import { effectiveReminderSettings } from './reminder-settings.js';
import { sentScheduledOffsets, setNextReminderOn } from './reminders.repository.js';

export function isRemindable(status: string): boolean {
  return (remindableInvoiceStatuses as readonly string[]).includes(status);
}

/** The next reminder day of one invoice under the given schedule (null: none left). */
export async function computeNextReminderOn(
  ctx: RequestContext,
  invoice: { id: string; dueDate: string; sentOn: string },
  settings: { enabled: boolean; offsets: readonly number[] },
  tx: Tx,
): Promise<string | null> {
  if (!settings.enabled) return null;
  return nextReminderOn({
    offsets: settings.offsets,
    dueDate: invoice.dueDate,
    sentOn: invoice.sentOn,
    alreadySentOffsets: await sentScheduledOffsets(ctx, invoice.id, tx),
  });
}

/** The day an invoice was sent, in the company's time zone (issue day for old rows). */
export function sentOnOf(
  invoice: { sentAt: Date | null; issuedOn: string },
  timeZone: string,
): string {
  return invoice.sentAt ? localDateOf(invoice.sentAt, timeZone) : invoice.issuedOn;
}

/** Called by the invoice send service when an invoice is first sent. */
export async function scheduleRemindersOnSend(
  ctx: RequestContext,
  invoice: { id: string; dueDate: string; sentOn: string },
  tx: Tx,
): Promise<void> {
  const settings = await effectiveReminderSettings(ctx, { tx });
  await setNextReminderOn(
    ctx,
    invoice.id,
    await computeNextReminderOn(ctx, invoice, settings, tx),
    tx,
  );
}

/**
 * Called wherever a payment, refund or credit changes the status: a closed invoice (paid) stops
 * its reminders, and a paid one that money went back out of (a refund) picks them up again.
 */
export async function followSettledStatus(
  ctx: RequestContext,
  invoice: { id: string; status: string; dueDate: string; sentAt: Date | null; issuedOn: string },
  status: string,
  tx: Tx,
): Promise<void> {
  if (!isRemindable(status)) {
    await setNextReminderOn(ctx, invoice.id, null, tx);
    return;
  }
  if (isRemindable(invoice.status)) return;
  const company = await findOwnCompany(ctx);
  await scheduleRemindersOnSend(
    ctx,
    {
      id: invoice.id,
      dueDate: invoice.dueDate,
      sentOn: sentOnOf(invoice, company?.timeZone ?? 'UTC'),
    },
    tx,
  );
}

/** Called when an invoice is voided. */
export async function stopReminders(ctx: RequestContext, invoiceId: string, tx: Tx) {
  await setNextReminderOn(ctx, invoiceId, null, tx);
}
