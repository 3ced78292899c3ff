// The webhook check with an injected clock: the signed timestamp may be up to the tolerance
// (300 s, the processor libraries' default) old, measured against the time the event arrived.
import Stripe from 'stripe';
import { describe, expect, it } from 'vitest';
import { loadEnv } from '../../config/env.js';
import { verifyProcessorEvent } from './webhook-verification.js';

const config = loadEnv({ NODE_ENV: 'test' }).processor;
const sdk = new Stripe(config.secretKey);
const signedAt = 1_900_000_000;
const payload = JSON.stringify({
  id: 'evt_test_clock',
  object: 'event',
  type: 'checkout.session.completed',
  created: signedAt,
  data: { object: { id: 'cs_test_clock' } },
});
const header = sdk.webhooks.generateTestHeaderString({
  payload,
  secret: config.webhookSecret,
  timestamp: signedAt,
});

describe('verifyProcessorEvent', () => {
  it('accepts an event received within 300 s of its signature', () => {
    const event = verifyProcessorEvent(
      config,
      Buffer.from(payload),
      header,
      (signedAt + 300) * 1000,
    );
    expect(event.id).toBe('evt_test_clock');
  });

  it('refuses one received 301 s later, naming the tolerance', () => {
    expect(() =>
      verifyProcessorEvent(config, Buffer.from(payload), header, (signedAt + 301) * 1000),
    ).toThrow(/older than 300 s/);
  });

  it('refuses a header signed with another secret whatever the clock says', () => {
    const other = sdk.webhooks.generateTestHeaderString({
      payload,
      secret: 'whsec_other_secret',
      timestamp: signedAt,
    });
    expect(() =>
      verifyProcessorEvent(config, Buffer.from(payload), other, signedAt * 1000),
    ).toThrow(/does not match the body/);
  });
});
