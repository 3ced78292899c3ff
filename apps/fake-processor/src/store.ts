// The fake's memory: sessions, payment intents, charges, refunds and events. Nothing is kept
// across restarts, like a fresh test account.
import type { FakeConfig } from './config.js';
import { newId, unixNow } from './ids.js';
import type {
  EventRecord,
  FakeCharge,
  FakeEvent,
  FakePaymentIntent,
  FakeRefund,
  FakeSession,
  SessionExtras,
} from './objects.js';
import { idOf } from './objects.js';
import { deliver } from './webhooks.js';

/** The API version the fake says it speaks in events (the SDK it was written against). */
export const fakeApiVersion = '2026-11-18.endive';

export interface NewSession {
  amountCents: number;
  currency: string;
  description: string;
  successUrl: string;
  cancelUrl: string | null;
  metadata: Record<string, string>;
  /** `payment_intent_data[metadata]`: the payment intent's (and so its charge's) own. */
  intentMetadata: Record<string, string>;
  clientReferenceId: string | null;
  customerEmail: string | null;
}

export type Outcome = 'succeeded' | 'declined';

export class FakeStore {
  readonly sessions = new Map<string, FakeSession>();
  readonly extras = new Map<string, SessionExtras>();
  readonly paymentIntents = new Map<string, FakePaymentIntent>();
  readonly charges = new Map<string, FakeCharge>();
  readonly refunds = new Map<string, FakeRefund>();
  readonly events: EventRecord[] = [];
  /** Deliveries still running, so tests and `stop()` can wait for them. */
  readonly pending = new Set<Promise<void>>();
  /** While true, the API endpoints answer 503 (the processor is "down"). */
  down = false;

  constructor(readonly config: FakeConfig) {}

  createSession(input: NewSession): FakeSession {
    const created = unixNow();
    const id = newId('cs_test');
    const intent: FakePaymentIntent = {
      id: newId('pi_test'),
      object: 'payment_intent',
      amount: input.amountCents,
      amount_capturable: 0,
      amount_received: 0,
      canceled_at: null,
      cancellation_reason: null,
      capture_method: 'automatic',
      client_secret: null,
      confirmation_method: 'automatic',
      created,
      currency: input.currency,
      customer: null,
      description: input.description,
      last_payment_error: null,
      latest_charge: null,
      livemode: false,
      // As on the hosted service, the session's metadata is not copied to its payment intent.
      metadata: { ...input.intentMetadata },
      payment_method_types: ['card'],
      receipt_email: input.customerEmail,
      status: 'requires_payment_method',
    };
    const session: FakeSession = {
      id,
      object: 'checkout.session',
      amount_subtotal: input.amountCents,
      amount_total: input.amountCents,
      cancel_url: input.cancelUrl,
      client_reference_id: input.clientReferenceId,
      created,
      currency: input.currency,
      customer_email: input.customerEmail,
      expires_at: created + 24 * 60 * 60,
      livemode: false,
      metadata: { ...input.metadata },
      mode: 'payment',
      payment_intent: intent.id,
      payment_method_types: ['card'],
      payment_status: 'unpaid',
      status: 'open',
      success_url: input.successUrl,
      url: `${this.config.publicUrl}/pay/${id}`,
    };
    this.paymentIntents.set(intent.id, intent);
    this.sessions.set(id, session);
    this.extras.set(id, {
      description: input.description,
      awaitingApproval: false,
      lastDecline: null,
    });
    return session;
  }

  intentOf(session: FakeSession): FakePaymentIntent {
    const intent = this.paymentIntents.get(idOf(session.payment_intent) ?? '');
    if (!intent) throw new Error(`session ${session.id} lost its payment intent`);
    return intent;
  }

  /** Finishes an open session as the customer's card did, and delivers the events. */
  complete(session: FakeSession, outcome: Outcome): void {
    const intent = this.intentOf(session);
    const extras = this.extras.get(session.id);
    if (extras) extras.awaitingApproval = false;
    if (outcome === 'declined') {
      intent.status = 'requires_payment_method';
      intent.last_payment_error = {
        type: 'card_error',
        code: 'card_declined',
        decline_code: 'generic_decline',
        message: 'The test card was declined.',
      };
      if (extras) extras.lastDecline = 'The card was declined. No money was taken.';
      this.emit('payment_intent.payment_failed', intent);
      return;
    }
    const charge: FakeCharge = {
      id: newId('ch_test'),
      object: 'charge',
      amount: intent.amount,
      amount_captured: intent.amount,
      amount_refunded: 0,
      captured: true,
      created: unixNow(),
      currency: intent.currency,
      description: intent.description,
      failure_code: null,
      failure_message: null,
      livemode: false,
      metadata: { ...intent.metadata },
      paid: true,
      payment_intent: intent.id,
      refunded: false,
      status: 'succeeded',
    };
    this.charges.set(charge.id, charge);
    intent.status = 'succeeded';
    intent.amount_received = intent.amount;
    intent.latest_charge = charge.id;
    intent.last_payment_error = null;
    session.status = 'complete';
    session.payment_status = 'paid';
    if (extras) extras.lastDecline = null;
    // The hosted service sends the session's event first for Checkout; order is not promised.
    this.emit('checkout.session.completed', session);
    this.emit('payment_intent.succeeded', intent);
  }

  /** A refund of `amount` (all that is left when absent) of a succeeded payment intent. */
  refund(
    intent: FakePaymentIntent,
    amount: number,
    reason: FakeRefund['reason'],
    metadata: Record<string, string>,
  ): FakeRefund {
    const charge = this.charges.get(idOf(intent.latest_charge) ?? '');
    if (!charge) throw new Error(`payment intent ${intent.id} has no charge`);
    const refund: FakeRefund = {
      id: newId('re'),
      object: 'refund',
      amount,
      charge: charge.id,
      created: unixNow(),
      currency: charge.currency,
      metadata: Object.keys(metadata).length ? metadata : { ...intent.metadata },
      payment_intent: intent.id,
      reason,
      status: 'succeeded',
    };
    this.refunds.set(refund.id, refund);
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded >= charge.amount;
    this.emit('refund.created', refund);
    this.emit('charge.refunded', charge);
    return refund;
  }

  /** Records an event with a snapshot of `object` and starts delivering it. */
  emit(type: FakeEvent['type'], object: FakeEvent['data']['object']): EventRecord {
    const event: FakeEvent = {
      id: newId('evt'),
      object: 'event',
      api_version: fakeApiVersion,
      created: unixNow(),
      data: { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: this.config.webhookUrl ? 1 : 0,
      request: { id: null, idempotency_key: null },
      type,
    };
    const record: EventRecord = {
      event,
      payload: JSON.stringify(event, null, 2),
      attempts: [],
      delivered: false,
    };
    this.events.push(record);
    this.startDelivery(record);
    return record;
  }

  startDelivery(record: EventRecord): void {
    const running = deliver(record, this.config).finally(() => this.pending.delete(running));
    this.pending.add(running);
  }

  /** Resolves once every delivery started so far has finished (delivered or given up). */
  async settled(): Promise<void> {
    while (this.pending.size > 0) await Promise.all([...this.pending]);
  }
}
