// Money against an invoice: manual payments, processor (card) payments, credit notes and void.
// Each runs in one transaction with the invoice row locked, so two payments never both fit
// under the same balance, and the kept totals (paid, credited) move with the rows they sum.
import { localDateOf, settledStatus } from '@seamwright/domain';
import type { StoredInvoiceStatus } from '@seamwright/domain';
import type { CreditNoteView, PaymentView, RecordPaymentData } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { followSettledStatus, stopReminders } from '../reminders/reminder-hooks.js';
import { moveJobForInvoice } from './invoice-job-moves.js';
import {
  createCreditNote,
  createPayment,
  findPaymentByIntent,
  revokeInvoiceLinks,
} from './invoice-money.repository.js';
import { balanceOf, toCreditNoteView, toPaymentView } from './invoice-view.js';
import type { InvoiceRow } from './invoices.repository.js';
import {
  ensureInvoiceCounter,
  lockInvoice,
  takeNumber,
  updateInvoice,
} from './invoices.repository.js';

function conflict(path: string, message: string): AppError {
  return new AppError('CONFLICT', `${path}: ${message}`, { errors: [{ path, message }] });
}

async function lockOrNotFound(ctx: RequestContext, invoiceId: string, tx: Tx) {
  const invoice = await lockInvoice(ctx, invoiceId, tx);
  if (!invoice) throw notFound('Invoice');
  return invoice;
}

/** Money comes in only on a sent invoice (a draft may still change; a void one is dead). */
function assertOpen(invoice: InvoiceRow, path: string): void {
  if (invoice.status === 'draft') throw conflict(path, 'The invoice is a draft: send it first');
  if (invoice.status === 'void') throw conflict(path, 'The invoice is void');
}

/**
 * Writes the new kept totals and status of a locked invoice after a payment, refund or credit;
 * keeps its reminders in step and moves the job when a final invoice is paid.
 */
export async function settle(
  ctx: RequestContext,
  invoice: InvoiceRow,
  change: { paidCents?: number; refundedCents?: number; creditedCents?: number },
  userId: string | null,
  tx: Tx,
): Promise<StoredInvoiceStatus> {
  const money = {
    totalCents: invoice.totalCents,
    paidCents: invoice.paidCents + (change.paidCents ?? 0),
    refundedCents: invoice.refundedCents + (change.refundedCents ?? 0),
    creditedCents: invoice.creditedCents + (change.creditedCents ?? 0),
  };
  const status = settledStatus(invoice.status as StoredInvoiceStatus, money);
  await updateInvoice(
    ctx,
    invoice.id,
    {
      paidCents: money.paidCents,
      refundedCents: money.refundedCents,
      creditedCents: money.creditedCents,
      status,
    },
    tx,
  );
  await followSettledStatus(ctx, invoice, status, tx);
  if (status === 'paid' && invoice.kind === 'final')
    await moveJobForInvoice(ctx, invoice.jobId, 'paid', { invoiceId: invoice.id, userId }, tx);
  return status;
}

export async function recordManualPayment(
  ctx: RequestContext,
  sequelize: Sequelize,
  invoiceId: string,
  input: RecordPaymentData,
): Promise<PaymentView> {
  return inTransaction(sequelize, async (tx) => {
    const invoice = await lockOrNotFound(ctx, invoiceId, tx);
    assertOpen(invoice, 'amountCents');
    const balance = balanceOf(invoice);
    if (input.amountCents > balance)
      throw conflict(
        'amountCents',
        `The balance is ${balance} cents: a payment may not be more than what is owed`,
      );
    const payment = await createPayment(
      ctx,
      {
        invoiceId,
        method: input.method,
        amountCents: input.amountCents,
        receivedOn: input.receivedOn,
        receivedAt: null,
        reference: input.reference ?? null,
        processorPaymentIntentId: null,
        processorCheckoutSessionId: null,
        recordedBy: ctx.userId,
      },
      tx,
    );
    const status = await settle(ctx, invoice, { paidCents: input.amountCents }, ctx.userId, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.payment_recorded',
        entity: 'job',
        entityId: invoice.jobId,
        data: {
          invoiceId,
          paymentId: payment.id,
          method: input.method,
          amountCents: input.amountCents,
          status,
        },
      },
      tx,
    );
    return toPaymentView(payment);
  });
}

export interface ProcessorPaymentInput {
  companyId: string;
  invoiceId: string;
  amountCents: number;
  paymentIntentId: string;
  checkoutSessionId: string | null;
  receivedAt: Date;
}

/**
 * Records a card payment reported by the processor (the webhook route calls this inside its
 * own transaction, with the event id recorded there). Idempotent on `paymentIntentId`: a second
 * call for the same intent changes nothing and answers the first payment with
 * `created: false`. The money has been taken, so a payment larger than the balance (a manual
 * payment raced the checkout) is still recorded; the balance goes below zero and the
 * invoice shows as paid. Throws NOT_FOUND for an unknown invoice of the company.
 */
export async function recordProcessorPayment(
  input: ProcessorPaymentInput,
  transaction: Tx,
): Promise<{ payment: PaymentView; created: boolean }> {
  // The processor is no member of the company: a context without a user, like the customer's.
  const ctx: RequestContext = { userId: '', companyId: input.companyId, role: 'bookkeeper' };
  const invoice = await lockOrNotFound(ctx, input.invoiceId, transaction);
  // Looked up under the invoice lock, so two deliveries of one event see each other.
  const existing = await findPaymentByIntent(ctx, input.paymentIntentId, transaction);
  if (existing) return { payment: toPaymentView(existing), created: false };
  if (!Number.isSafeInteger(input.amountCents) || input.amountCents <= 0)
    throw new AppError('VALIDATION_FAILED', 'amountCents: must be a whole number above 0', {
      errors: [{ path: 'amountCents', message: 'must be a whole number above 0' }],
    });
  const company = await findOwnCompany(ctx);
  const payment = await createPayment(
    ctx,
    {
      invoiceId: invoice.id,
      method: 'card',
      amountCents: input.amountCents,
      receivedOn: localDateOf(input.receivedAt, company?.timeZone ?? 'UTC'),
      receivedAt: input.receivedAt,
      reference: null,
      processorPaymentIntentId: input.paymentIntentId,
      processorCheckoutSessionId: input.checkoutSessionId,
      recordedBy: null,
    },
    transaction,
  );
  // A void invoice that is paid anyway keeps void (the owner refunds); the money is on record.
  const status =
    invoice.status === 'void'
      ? 'void'
      : await settle(ctx, invoice, { paidCents: input.amountCents }, null, transaction);
  if (invoice.status === 'void')
    await updateInvoice(
      ctx,
      invoice.id,
      { paidCents: invoice.paidCents + input.amountCents },
      transaction,
    );
  await recordAuditEvent(
    ctx,
    {
      action: 'job.payment_recorded',
      entity: 'job',
      entityId: invoice.jobId,
      data: {
        invoiceId: invoice.id,
        paymentId: payment.id,
        method: 'card',
        amountCents: input.amountCents,
        paymentIntentId: input.paymentIntentId,
        status,
      },
      userId: null,
    },
    transaction,
  );
  return { payment: toPaymentView(payment), created: true };
}

export async function createInvoiceCreditNote(
  ctx: RequestContext,
  sequelize: Sequelize,
  invoiceId: string,
  input: { amountCents: number; reason: string },
): Promise<CreditNoteView> {
  const company = await findOwnCompany(ctx);
  const today = localDateOf(new Date(), company?.timeZone ?? 'UTC');
  await ensureInvoiceCounter(ctx, sequelize);
  return inTransaction(sequelize, async (tx) => {
    const invoice = await lockOrNotFound(ctx, invoiceId, tx);
    assertOpen(invoice, 'amountCents');
    const balance = balanceOf(invoice);
    if (input.amountCents > balance)
      throw conflict(
        'amountCents',
        `The balance is ${balance} cents: a credit note may not be more than what is owed`,
      );
    const number = await takeNumber(ctx, sequelize, 'credit_note', tx);
    const note = await createCreditNote(
      ctx,
      {
        invoiceId,
        number,
        amountCents: input.amountCents,
        reason: input.reason,
        issuedOn: today,
        createdBy: ctx.userId,
      },
      tx,
    );
    const status = await settle(ctx, invoice, { creditedCents: input.amountCents }, ctx.userId, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.credit_note_created',
        entity: 'job',
        entityId: invoice.jobId,
        data: { invoiceId, creditNoteId: note.id, number, amountCents: input.amountCents, status },
      },
      tx,
    );
    return toCreditNoteView(note);
  });
}

export async function voidInvoice(
  ctx: RequestContext,
  sequelize: Sequelize,
  invoiceId: string,
  reason: string,
): Promise<void> {
  await inTransaction(sequelize, async (tx) => {
    const invoice = await lockOrNotFound(ctx, invoiceId, tx);
    if (invoice.status === 'void') throw conflict('status', 'The invoice is already void');
    if (invoice.paidCents > 0)
      throw conflict(
        'status',
        'Payments are recorded on this invoice: refund them or write a credit note instead',
      );
    const now = new Date();
    await updateInvoice(ctx, invoiceId, { status: 'void', voidedAt: now, voidReason: reason }, tx);
    await stopReminders(ctx, invoiceId, tx);
    const revoked = await revokeInvoiceLinks(ctx, invoiceId, now, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.invoice_voided',
        entity: 'job',
        entityId: invoice.jobId,
        data: { invoiceId, number: invoice.number, reason, linksRevoked: revoked },
      },
      tx,
    );
  });
}
