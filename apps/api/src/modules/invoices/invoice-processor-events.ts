// The processor's word on a card payment, recorded against the invoice. Registered once when
// the invoices routes are (the webhook route itself lives in modules/processor). The event id
// is recorded in the same transaction, and recordProcessorPayment is idempotent on the payment
// intent too, so a replay or a second event type for one payment records nothing more.
import type Stripe from 'stripe';
import { AppError } from '../../errors.js';
import { registerProcessorEventHandler } from '../processor/index.js';
import type { ProcessorEventHandler } from '../processor/index.js';
import { recordProcessorPayment } from './invoice-payments.service.js';
import { recordRefund } from './invoice-refunds.service.js';

let registered = false;

function intentIdOf(session: Stripe.Checkout.Session): string | null {
  const intent = session.payment_intent;
  return typeof intent === 'string' ? intent : (intent?.id ?? null);
}

export function registerInvoiceProcessorEvents(): void {
  if (registered) return;
  registered = true;
  registerProcessorEventHandler('refund.created', recordRefundEvent);
  registerProcessorEventHandler('checkout.session.completed', async (event, transaction, deps) => {
    const session = event.data.object as Stripe.Checkout.Session;
    const { companyId, invoiceId } = session.metadata ?? {};
    const paymentIntentId = intentIdOf(session);
    // Sessions we did not open (no invoice metadata) and unpaid completions are not ours to
    // record; the event id is still kept, so they are not looked at again.
    if (!companyId || !invoiceId || !paymentIntentId || session.payment_status !== 'paid') {
      deps.logger.info({ event: event.id }, 'checkout event without an invoice payment ignored');
      return;
    }
    const recorded = await recordProcessorPayment(
      {
        companyId,
        invoiceId,
        amountCents: session.amount_total ?? 0,
        paymentIntentId,
        checkoutSessionId: session.id,
        receivedAt: new Date(event.created * 1000),
      },
      transaction,
    ).catch((error: unknown) => {
      // An invoice that is not there (metadata from another deployment sharing the key) can
      // never be recorded; answering 200 stops the processor sending it again and again.
      if (error instanceof AppError && error.code === 'NOT_FOUND') return null;
      throw error;
    });
    if (!recorded) {
      deps.logger.warn({ event: event.id, companyId, invoiceId }, 'card payment for no invoice');
      return;
    }
    deps.logger.info(
      { event: event.id, invoiceId, created: recorded.created },
      'card payment recorded',
    );
  });
}

/**
 * A refund made through our own route carries its ids in the metadata; the route has usually
 * recorded it already (same processor refund id: nothing more happens). It is recorded here
 * when the route's transaction failed after the processor said yes.
 */
const recordRefundEvent: ProcessorEventHandler = async (event, transaction, deps) => {
  const refund = event.data.object as Stripe.Refund;
  const { companyId, invoiceId, paymentId, refundId } = refund.metadata ?? {};
  if (!companyId || !invoiceId || !paymentId || !refundId) {
    deps.logger.info({ event: event.id }, 'refund event without our ids ignored');
    return;
  }
  const ctx = { userId: '', companyId, role: 'owner' } as const;
  const recorded = await recordRefund(
    ctx,
    {
      id: refundId,
      invoiceId,
      paymentId,
      amountCents: refund.amount,
      reason: 'Refund recorded from the processor',
      processorRefundId: refund.id,
      createdBy: null,
    },
    transaction,
  ).catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'NOT_FOUND') return null;
    throw error;
  });
  deps.logger.info({ event: event.id, created: recorded?.created ?? null }, 'refund event');
};
