// The processor calls Seamwright makes: a Checkout Session for one amount (the customer pays on
// the processor's hosted page) and refunds of a paid one. Amounts are integer cents.
//
// Metadata: the invoice work passes `{ companyId, invoiceId }`. It is put on the session and on
// its payment intent, so `checkout.session.completed`, `payment_intent.*` and `charge.refunded`
// events all carry it back to the webhook handlers, which use it to find the company and the
// invoice (the webhook route has no session or company of its own).
import type { ProcessorConfig } from '../../config/env.js';
import { processorClient } from './processor-client.js';
import { callProcessor } from './processor-errors.js';

export interface CheckoutSessionInput {
  amountCents: number;
  /** ISO 4217, lower or upper case (`usd`). */
  currency: string;
  /** Shown on the hosted page and the receipt ("Invoice 1042 · Northside Turf Co."). */
  description: string;
  customerEmail?: string | null;
  /** May contain `{CHECKOUT_SESSION_ID}`, which the processor fills in. */
  successUrl: string;
  cancelUrl: string;
  metadata: Record<string, string>;
  /** Defaults to `metadata.invoiceId`. */
  clientReferenceId?: string;
  /** Same key, same session: a retried request does not open a second one. */
  idempotencyKey?: string;
}

export interface CheckoutSessionRef {
  id: string;
  /** The hosted payment page to send the customer to. */
  url: string;
  paymentIntentId: string | null;
}

export async function createCheckoutSession(
  config: ProcessorConfig,
  input: CheckoutSessionInput,
): Promise<CheckoutSessionRef> {
  if (!Number.isInteger(input.amountCents) || input.amountCents < 1)
    throw new RangeError(`amountCents must be a positive whole number, got ${input.amountCents}`);
  const client = processorClient(config);
  const session = await callProcessor(() =>
    client.checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: input.currency.toLowerCase(),
              unit_amount: input.amountCents,
              product_data: { name: input.description },
            },
          },
        ],
        success_url: input.successUrl,
        cancel_url: input.cancelUrl,
        ...(input.customerEmail ? { customer_email: input.customerEmail } : {}),
        ...((input.clientReferenceId ?? input.metadata.invoiceId)
          ? { client_reference_id: input.clientReferenceId ?? input.metadata.invoiceId }
          : {}),
        metadata: input.metadata,
        payment_intent_data: { metadata: input.metadata, description: input.description },
      },
      input.idempotencyKey ? { idempotencyKey: input.idempotencyKey } : undefined,
    ),
  );
  if (!session.url) throw new Error(`checkout session ${session.id} came back without a url`);
  const intent = session.payment_intent;
  return {
    id: session.id,
    url: session.url,
    paymentIntentId: typeof intent === 'string' ? intent : (intent?.id ?? null),
  };
}

export interface RefundInput {
  paymentIntentId: string;
  /** Absent: everything not yet refunded. */
  amountCents?: number;
  metadata?: Record<string, string>;
  idempotencyKey?: string;
}

export interface RefundRef {
  id: string;
  amountCents: number;
  status: string | null;
}

export async function refundPayment(
  config: ProcessorConfig,
  input: RefundInput,
): Promise<RefundRef> {
  if (
    input.amountCents !== undefined &&
    (!Number.isInteger(input.amountCents) || input.amountCents < 1)
  )
    throw new RangeError(`amountCents must be a positive whole number, got ${input.amountCents}`);
  const client = processorClient(config);
  const refund = await callProcessor(() =>
    client.refunds.create(
      {
        payment_intent: input.paymentIntentId,
        ...(input.amountCents !== undefined ? { amount: input.amountCents } : {}),
        ...(input.metadata ? { metadata: input.metadata } : {}),
      },
      input.idempotencyKey ? { idempotencyKey: input.idempotencyKey } : undefined,
    ),
  );
  return { id: refund.id, amountCents: refund.amount, status: refund.status };
}
