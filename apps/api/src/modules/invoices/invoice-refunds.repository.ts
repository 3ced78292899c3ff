// Refund rows (migration 0021) and the payment they come out of.
import type { RequestContext } from '../../context.js';
import { PaymentModel, RefundModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type RefundRow = RefundModel['_attributes'];

export async function findRefundByProcessorId(
  ctx: RequestContext,
  processorRefundId: string,
  tx: Tx,
): Promise<RefundRow | null> {
  const [row] = await scoped(ctx, RefundModel).findAll({
    where: { processorRefundId },
    // A locking read sees a refund another transaction has just committed.
    tx,
    lock: true,
  });
  return row ? { ...row, amountCents: Number(row.amountCents) } : null;
}

export function createRefund(
  ctx: RequestContext,
  values: Omit<RefundRow, 'companyId' | 'createdAt'>,
  tx: Tx,
): Promise<RefundRow> {
  return scoped(ctx, RefundModel).create(values, tx);
}

/** The payment, if it belongs to `invoiceId` (another invoice's payment is not found). */
export async function findPaymentOfInvoice(
  ctx: RequestContext,
  invoiceId: string,
  paymentId: string,
  tx: Tx,
) {
  const row = await scoped(ctx, PaymentModel).findById(paymentId, { tx, lock: true });
  if (!row || row.invoiceId !== invoiceId) return null;
  return { ...row, amountCents: Number(row.amountCents), refundedCents: Number(row.refundedCents) };
}

export function updatePaymentRefunded(
  ctx: RequestContext,
  paymentId: string,
  refundedCents: number,
  tx: Tx,
) {
  return scoped(ctx, PaymentModel).update(paymentId, { refundedCents }, tx);
}
