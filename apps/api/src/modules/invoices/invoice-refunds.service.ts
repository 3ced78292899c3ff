// Refunds of card payments, by the owner, through the processor. The refund is asked of the
// processor while the invoice row is locked, then recorded in the same transaction: if the
// processor cannot be reached nothing is recorded (503); if it refunds, the row, the payment's
// and the invoice's refunded totals and the status move together. The processor's
// `refund.created` webhook records the same refund (keyed by its id) should the transaction
// have failed after the processor said yes, so a refund is never lost and never counted twice.
import { randomUUID } from 'node:crypto';
import type { RefundView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { ServiceDeps } from '../../deps.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { processorProblem, refundPayment } from '../processor/index.js';
import {
  createRefund,
  findPaymentOfInvoice,
  findRefundByProcessorId,
  updatePaymentRefunded,
} from './invoice-refunds.repository.js';
import type { RefundRow } from './invoice-refunds.repository.js';
import { settle } from './invoice-payments.service.js';
import { lockInvoice } from './invoices.repository.js';
import type { InvoiceRow } from './invoices.repository.js';

function conflict(path: string, message: string): AppError {
  return new AppError('CONFLICT', `${path}: ${message}`, { errors: [{ path, message }] });
}

export function toRefundView(row: RefundRow): RefundView {
  return {
    id: row.id,
    paymentId: row.paymentId,
    amountCents: Number(row.amountCents),
    reason: row.reason,
    processorRefundId: row.processorRefundId,
    createdAt: row.createdAt.toISOString(),
  };
}

export interface RecordRefundInput {
  id: string;
  invoiceId: string;
  paymentId: string;
  amountCents: number;
  reason: string;
  processorRefundId: string;
  createdBy: string | null;
}

/** Writes a refund the processor has made against a locked invoice and payment. */
async function applyRefund(
  ctx: RequestContext,
  invoice: InvoiceRow,
  payment: { id: string; refundedCents: number },
  input: RecordRefundInput,
  tx: Tx,
): Promise<RefundRow> {
  const refund = await createRefund(ctx, input, tx);
  await updatePaymentRefunded(ctx, payment.id, payment.refundedCents + input.amountCents, tx);
  await settle(ctx, invoice, { refundedCents: input.amountCents }, input.createdBy, tx);
  await recordAuditEvent(
    ctx,
    {
      action: 'invoice.refunded',
      entity: 'invoice',
      entityId: invoice.id,
      data: { paymentId: payment.id, refundId: refund.id, amountCents: input.amountCents },
    },
    tx,
  );
  return refund;
}

/**
 * Records a refund the processor reports (its webhook), once: a second call with the same
 * processor refund id answers the first record.
 */
export async function recordRefund(
  ctx: RequestContext,
  input: RecordRefundInput,
  tx: Tx,
): Promise<{ refund: RefundRow; created: boolean }> {
  const existing = await findRefundByProcessorId(ctx, input.processorRefundId, tx);
  if (existing) return { refund: existing, created: false };
  const invoice = await lockInvoice(ctx, input.invoiceId, tx);
  const payment = await findPaymentOfInvoice(ctx, input.invoiceId, input.paymentId, tx);
  if (!invoice || !payment) throw notFound('Payment');
  return { refund: await applyRefund(ctx, invoice, payment, input, tx), created: true };
}

export interface RefundRequest {
  /** Absent: all that is left of the payment. */
  amountCents?: number | undefined;
  reason: string;
}

/** `POST /api/invoices/:id/payments/:paymentId/refunds` (owner). */
export async function refundCardPayment(
  ctx: RequestContext,
  deps: ServiceDeps,
  invoiceId: string,
  paymentId: string,
  request: RefundRequest,
): Promise<RefundView> {
  // Made once, outside the retried transaction: a deadlock retry asks the processor again
  // with the same idempotency key and gets the same refund, never a second one.
  const refundId = randomUUID();
  return inTransaction(deps.sequelize, async (tx) => {
    const invoice = await lockInvoice(ctx, invoiceId, tx);
    if (!invoice) throw notFound('Invoice');
    const payment = await findPaymentOfInvoice(ctx, invoiceId, paymentId, tx);
    if (!payment) throw notFound('Payment');
    if (payment.method !== 'card' || !payment.processorPaymentIntentId)
      throw conflict(
        'paymentId',
        'Only card payments are refunded through the processor; give cheque, transfer or cash payments back outside Seamwright',
      );
    const refundable = payment.amountCents - payment.refundedCents;
    if (refundable <= 0) throw conflict('paymentId', 'This payment has been refunded in full');
    const amountCents = request.amountCents ?? refundable;
    if (amountCents > refundable)
      throw conflict(
        'amountCents',
        `At most ${refundable} cents of this payment can still be refunded`,
      );
    let processorRefund;
    try {
      processorRefund = await refundPayment(deps.env.processor, {
        paymentIntentId: payment.processorPaymentIntentId,
        amountCents,
        metadata: { companyId: ctx.companyId, invoiceId, paymentId, refundId },
        idempotencyKey: `refund-${refundId}`,
      });
    } catch (error) {
      throw processorProblem(error) ?? error;
    }
    const refund = await applyRefund(
      ctx,
      invoice,
      payment,
      {
        id: refundId,
        invoiceId,
        paymentId,
        amountCents: processorRefund.amountCents,
        reason: request.reason,
        processorRefundId: processorRefund.id,
        createdBy: ctx.userId,
      },
      tx,
    );
    return toRefundView(refund);
  });
}
