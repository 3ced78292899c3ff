// Signed processor events for the webhook tests, made with the SDK's own test helper so the
// signature is the processor's scheme, not ours.
import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';
import { testProcessor } from '../../fixtures/test-env.js';

const sdk = new Stripe(testProcessor.secretKey);

export const webhookPath = '/api/webhooks/processor';

export function newEventId(): string {
  return `evt_test_${randomBytes(12).toString('hex')}`;
}

export function eventPayload(
  type: string,
  object: Record<string, unknown>,
  id: string = newEventId(),
): string {
  return JSON.stringify({
    id,
    object: 'event',
    api_version: '2026-11-18.endive',
    created: Math.floor(Date.now() / 1000),
    data: { object },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  });
}

/** The Stripe-Signature header for `payload`, by default now and with the suite's secret. */
export function signatureFor(
  payload: string,
  options: { secret?: string; timestamp?: number } = {},
): string {
  return sdk.webhooks.generateTestHeaderString({
    payload,
    secret: options.secret ?? testProcessor.webhookSecret,
    ...(options.timestamp !== undefined ? { timestamp: options.timestamp } : {}),
  });
}
