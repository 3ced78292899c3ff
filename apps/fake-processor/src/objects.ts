// The objects the fake keeps, typed as the subsets of the official SDK's types that it fills in
// (`Pick<…>`), so a field the fake returns always has the shape the SDK promises its callers.
// `stripe` is only a dev dependency here: these are type imports, erased at run time.
import type Stripe from 'stripe';

export type FakeSession = Pick<
  Stripe.Checkout.Session,
  | 'id'
  | 'object'
  | 'amount_subtotal'
  | 'amount_total'
  | 'cancel_url'
  | 'client_reference_id'
  | 'created'
  | 'currency'
  | 'customer_email'
  | 'expires_at'
  | 'livemode'
  | 'metadata'
  | 'mode'
  | 'payment_intent'
  | 'payment_method_types'
  | 'payment_status'
  | 'status'
  | 'success_url'
  | 'url'
>;

export type FakePaymentIntent = Pick<
  Stripe.PaymentIntent,
  | 'id'
  | 'object'
  | 'amount'
  | 'amount_capturable'
  | 'amount_received'
  | 'canceled_at'
  | 'cancellation_reason'
  | 'capture_method'
  | 'client_secret'
  | 'confirmation_method'
  | 'created'
  | 'currency'
  | 'customer'
  | 'description'
  | 'last_payment_error'
  | 'latest_charge'
  | 'livemode'
  | 'metadata'
  | 'payment_method_types'
  | 'receipt_email'
  | 'status'
>;

export type FakeCharge = Pick<
  Stripe.Charge,
  | 'id'
  | 'object'
  | 'amount'
  | 'amount_captured'
  | 'amount_refunded'
  | 'captured'
  | 'created'
  | 'currency'
  | 'description'
  | 'failure_code'
  | 'failure_message'
  | 'livemode'
  | 'metadata'
  | 'paid'
  | 'payment_intent'
  | 'refunded'
  | 'status'
>;

export type FakeRefund = Pick<
  Stripe.Refund,
  | 'id'
  | 'object'
  | 'amount'
  | 'charge'
  | 'created'
  | 'currency'
  | 'metadata'
  | 'payment_intent'
  | 'reason'
  | 'status'
>;

/** What the fake delivers: `Stripe.Event`'s fields, with the object of any of ours. */
export interface FakeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: FakeSession | FakePaymentIntent | FakeCharge | FakeRefund };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: Stripe.Event.Type;
}

/** One delivery attempt of one event, for `GET /_test/events`. */
export interface DeliveryAttempt {
  at: string;
  url: string;
  status: number | null;
  error: string | null;
}

export interface EventRecord {
  event: FakeEvent;
  /** The exact body that was signed and sent (the signature covers these bytes). */
  payload: string;
  attempts: DeliveryAttempt[];
  delivered: boolean;
}

/** The test card behind a session's line, kept beside it (the hosted service keeps the PAN). */
export interface SessionExtras {
  description: string;
  /** Set when a card needing a second step was entered; cleared once approved or failed. */
  awaitingApproval: boolean;
  lastDecline: string | null;
}

/** The id of a field the SDK types as "an id, or the expanded object". */
export function idOf(value: string | { id: string } | null): string | null {
  return value === null ? null : typeof value === 'string' ? value : value.id;
}
