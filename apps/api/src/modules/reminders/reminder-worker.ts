// The payment-reminder worker, started by the API process (server.ts). Each pass works through
// the invoices whose next reminder day has come, one invoice per transaction:
//
//   1. claim one due invoice: SELECT … FOR UPDATE SKIP LOCKED (reminders.repository.ts), so two
//      API processes never hold the same invoice and never wait for each other;
//   2. pick the step with dueReminderStep on the company's local "today";
//   3. log it (UNIQUE (company_id, invoice_id, offset_days): a step can be logged once only);
//   4. send the e-mail through SMTP while the row lock is still held;
//   5. set next_reminder_on to the next step, and commit.
//
// The guarantee, exactly: a step is never skipped (next_reminder_on moves only in the commit
// that logs the step, so a crash or a failed SMTP hand-off before the commit leaves the invoice
// due, and the next pass of any process sends it), and a step is never sent twice by two live
// processes (the row lock and the unique key). The one honest exception: if a process dies
// after the SMTP server accepted the message but before the commit reached MariaDB, the
// transaction rolls back and the step is sent once more. Both copies carry the same
// deterministic Message-ID (reminderMessageId), so the resend is recognisable. Exactly-once
// across a database and an SMTP server is not possible without the SMTP side taking part; this
// keeps the window to one message per crashed process (one invoice per transaction).
import {
  dueReminderStep,
  localDateOf,
  nextReminderOn,
  remindableInvoiceStatuses,
} from '@seamwright/domain';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Env } from '../../config/env.js';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import type { Mailer } from '../../mail/mailer.js';
import { findOwnCompany } from '../company/company.repository.js';
import { lockInvoice } from '../invoices/invoices.repository.js';
import { deliverReminder } from './reminder-delivery.js';
import { isRemindable, sentOnOf } from './reminder-hooks.js';
import { effectiveReminderSettings } from './reminder-settings.js';
import {
  sentScheduledOffsets,
  setNextReminderOn,
  unsafeClaimDueInvoices,
} from './reminders.repository.js';

export interface ReminderWorkerDeps {
  env: Env;
  sequelize: Sequelize;
  mailer: Mailer;
  logger: Logger;
}

export interface ReminderWorkerOptions {
  /** The worker's clock; tests pass their own to run a month in seconds. */
  now?: () => Date;
  intervalMs?: number;
  /** Invoices one pass handles at most (each in its own transaction). */
  batchSize?: number;
}

export interface PassResult {
  sent: number;
  /** Invoices looked at: sent, rescheduled, stopped or not yet due locally. */
  handled: number;
  failed: number;
}

/** The easternmost zone's date: no company's local day is later than this one. */
const earliestZone = 'Etc/GMT-14';

/** A context for the claimed invoice's company; the worker acts as no member (no user). */
function systemContext(companyId: string): RequestContext {
  return { userId: '', companyId, role: 'bookkeeper' };
}

type Outcome = 'sent' | 'handled' | 'not-due';

export function createReminderWorker(
  deps: ReminderWorkerDeps,
  options: ReminderWorkerOptions = {},
) {
  const now = options.now ?? (() => new Date());
  const intervalMs = options.intervalMs ?? deps.env.reminders.intervalMs;
  const batchSize = options.batchSize ?? deps.env.reminders.batchSize;

  async function handle(
    ctx: RequestContext,
    invoiceId: string,
    at: Date,
    tx: Tx,
  ): Promise<Outcome> {
    const invoice = await lockInvoice(ctx, invoiceId, tx);
    if (!invoice || !isRemindable(invoice.status) || !invoice.nextReminderOn) {
      if (invoice) await setNextReminderOn(ctx, invoiceId, null, tx);
      return 'handled';
    }
    const company = await findOwnCompany(ctx);
    const timeZone = company?.timeZone ?? 'UTC';
    const today = localDateOf(at, timeZone);
    if (invoice.nextReminderOn > today) return 'not-due';
    const settings = await effectiveReminderSettings(ctx, { tx });
    if (!settings.enabled) {
      await setNextReminderOn(ctx, invoiceId, null, tx);
      return 'handled';
    }
    const sent = await sentScheduledOffsets(ctx, invoiceId, tx);
    const sentOn = sentOnOf(invoice, timeZone);
    const schedule = { offsets: settings.offsets, dueDate: invoice.dueDate, sentOn };
    const step = dueReminderStep({ ...schedule, today, alreadySentOffsets: sent });
    if (step)
      await deliverReminder(
        deps,
        ctx,
        invoice,
        settings,
        { kind: 'scheduled', step, to: null, today, userId: null },
        tx,
      );
    const next = nextReminderOn({
      ...schedule,
      alreadySentOffsets: step ? [...sent, step.offsetDays] : sent,
    });
    await setNextReminderOn(ctx, invoiceId, next, tx);
    return step ? 'sent' : 'handled';
  }

  /** One pass over what is due now; resolves when it is done (tests call this directly). */
  async function runOnce(): Promise<PassResult> {
    const at = now();
    const latestDay = localDateOf(at, earliestZone);
    const result: PassResult = { sent: 0, handled: 0, failed: 0 };
    // Invoices this pass already passed over (not yet due locally, or failed): not claimed again.
    const passedOver = new Set<string>();
    for (let i = 0; i < batchSize; i += 1) {
      // Not inTransaction(): that retries after a deadlock, and this work has sent an e-mail.
      const tx = await deps.sequelize.transaction();
      let claimedId: string | null = null;
      try {
        const [claimed] = await unsafeClaimDueInvoices(
          deps.sequelize,
          {
            latestDay,
            statuses: remindableInvoiceStatuses,
            limit: 1,
            exclude: [...passedOver],
          },
          tx,
        );
        if (!claimed) {
          await tx.commit();
          break;
        }
        claimedId = claimed.id;
        const outcome = await handle(systemContext(claimed.companyId), claimed.id, at, tx);
        await tx.commit();
        if (outcome === 'not-due') passedOver.add(claimed.id);
        else result.handled += 1;
        if (outcome === 'sent') result.sent += 1;
      } catch (error) {
        await tx.rollback().catch(() => undefined);
        result.failed += 1;
        if (claimedId) passedOver.add(claimedId);
        deps.logger.error({ err: error, invoiceId: claimedId }, 'payment reminder failed');
        // A failure with nothing claimed is the database itself: try again next pass.
        if (!claimedId) break;
      }
    }
    return result;
  }

  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;
  let stopped = true;

  function schedule(): void {
    if (stopped) return;
    timer = setTimeout(() => {
      running = runOnce()
        .catch((error: unknown) => deps.logger.error({ err: error }, 'reminder pass failed'))
        .finally(() => {
          running = null;
          schedule();
        });
    }, intervalMs);
  }

  return {
    runOnce,
    start(): void {
      if (!stopped) return;
      stopped = false;
      schedule();
    },
    /** Stops the timer and waits for a pass in progress to finish. */
    async stop(): Promise<void> {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running;
    },
  };
}

export type ReminderWorker = ReturnType<typeof createReminderWorker>;
