// Checking a delivery before anything is read from it: the signature over the exact raw bytes
// and the age of its signed timestamp, both by the SDK's own `webhooks.constructEvent`, then
// that the JSON is an event at all. Any failure is a 400 that changes nothing.
import Stripe from 'stripe';
import type { ProcessorConfig } from '../../config/env.js';
import { AppError } from '../../errors.js';
import { processorClient } from './processor-client.js';

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The verified event. `receivedAtMs` is the clock the timestamp is compared with (tests pass
 * their own; the route passes none, meaning now).
 */
export function verifyProcessorEvent(
  config: ProcessorConfig,
  rawBody: Buffer,
  signature: string | undefined,
  receivedAtMs?: number,
): Stripe.Event {
  if (!signature)
    throw new AppError(
      'BAD_REQUEST',
      'The Stripe-Signature header is missing; the event was not read',
    );
  let event: unknown;
  try {
    event = processorClient(config).webhooks.constructEvent(
      rawBody,
      signature,
      config.webhookSecret,
      config.webhookToleranceSeconds,
      undefined,
      receivedAtMs,
    );
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) {
      const stale = /tolerance/i.test(error.message);
      throw new AppError(
        'BAD_REQUEST',
        stale
          ? `The event's signed timestamp is older than ${config.webhookToleranceSeconds} s; it was not read`
          : 'The Stripe-Signature header does not match the body; the event was not read',
      );
    }
    // A valid signature over bytes that are not JSON.
    throw new AppError('BAD_REQUEST', 'The signed body is not valid JSON; the event was not read');
  }
  if (
    !isRecord(event) ||
    typeof event.id !== 'string' ||
    event.id.length === 0 ||
    event.id.length > 255 ||
    typeof event.type !== 'string' ||
    event.type.length === 0 ||
    event.type.length > 100 ||
    !isRecord(event.data) ||
    !isRecord(event.data.object)
  )
    throw new AppError(
      'BAD_REQUEST',
      'The signed body is not a processor event (id, type, data.object)',
    );
  return event as unknown as Stripe.Event;
}
