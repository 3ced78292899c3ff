// Handlers for processor events, by event type. A module registers its own at load time, e.g.
// the invoices module:
//
//   registerProcessorEventHandler('checkout.session.completed', async (event, transaction, deps) => {
//     const session = event.data.object as Stripe.Checkout.Session;
//     const { companyId, invoiceId } = session.metadata ?? {};   // put there by createCheckoutSession
//     …record the payment through scoped({ companyId, … }, …) with { transaction }…
//   });
//
// Handlers run inside the transaction that records the event id (webhook.service.ts), so
// their effect and the record commit together or not at all: a replay finds the id taken and
// runs nothing. A handler that throws rolls both back and the route answers 500, so the
// processor delivers the event again later. Events carry no session: the company comes from
// the metadata, which only our own API key could have put there (the signature proves the
// event is the processor's).
import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import type { ServiceDeps } from '../../deps.js';

export type ProcessorEventHandler = (
  event: Stripe.Event,
  transaction: Transaction,
  deps: ServiceDeps,
) => Promise<void>;

/**
 * A type the processor sends, or any other string (tests register types of their own); the
 * `string & {}` keeps editors suggesting the processor's names.
 */
export type ProcessorEventType = Stripe.Event.Type | (string & {});

const handlers = new Map<string, ProcessorEventHandler[]>();

/** Adds a handler for `type`; returns a function that removes it again (for tests). */
export function registerProcessorEventHandler(
  type: ProcessorEventType,
  handler: ProcessorEventHandler,
): () => void {
  handlers.set(type, [...(handlers.get(type) ?? []), handler]);
  return () => {
    handlers.set(
      type,
      (handlers.get(type) ?? []).filter((h) => h !== handler),
    );
  };
}

/** The handlers for `type`, in the order they were registered (none for an unknown type). */
export function processorEventHandlersFor(type: string): readonly ProcessorEventHandler[] {
  return handlers.get(type) ?? [];
}
