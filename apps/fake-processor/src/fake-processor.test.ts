// The fake driven by the official SDK, as the API drives it, with every webhook checked by the
// SDK's own `webhooks.constructEvent` (the outside check that it signs as the processor does).
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import Stripe from 'stripe';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { idOf } from './objects.js';
import { startFakeProcessor } from './server.js';
import type { FakeProcessor } from './server.js';

const apiKey = 'sk_test_fake_processor_unit_tests';
const webhookSecret = 'whsec_fake_processor_unit_tests';

interface Received {
  event: Stripe.Event;
  header: string;
}

let fake: FakeProcessor;
let receiver: Server;
const received: Received[] = [];
/** Statuses the receiver answers with, one per request; 200 once they run out. */
const scripted: number[] = [];

function sdk(key = apiKey): Stripe {
  return new Stripe(key, {
    host: '127.0.0.1',
    port: fake.port,
    protocol: 'http',
    maxNetworkRetries: 0,
    telemetry: false,
  });
}

beforeAll(async () => {
  receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      const status = scripted.shift() ?? 200;
      if (status === 200) {
        const header = String(req.headers['stripe-signature']);
        // Throws (and so fails the test through a missing event) when the signature is wrong.
        const event = sdk().webhooks.constructEvent(Buffer.concat(chunks), header, webhookSecret);
        received.push({ event, header });
      }
      res.writeHead(status).end();
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, '127.0.0.1', resolve));
  const webhookUrl = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/hook`;
  fake = await startFakeProcessor(0, {
    apiKey,
    webhookSecret,
    webhookUrl,
    retryDelaysMs: [20, 40],
  });
});

afterAll(async () => {
  await fake.stop();
  await new Promise((resolve) => receiver.close(resolve));
});

beforeEach(async () => {
  await fake.store.settled();
  received.length = 0;
  scripted.length = 0;
  fake.store.down = false;
});

async function newSession(amount = 12_345): Promise<Stripe.Checkout.Session> {
  return sdk().checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: 'usd',
          unit_amount: amount,
          product_data: { name: 'Invoice 1042 · Northside Turf Co.' },
        },
      },
    ],
    success_url: 'http://127.0.0.1:9/paid?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:9/back',
    customer_email: 'pat@example.test',
    client_reference_id: 'invoice-1042',
    metadata: { companyId: 'company-1', invoiceId: 'invoice-1' },
    payment_intent_data: { metadata: { companyId: 'company-1', invoiceId: 'invoice-1' } },
  });
}

const complete = (id: string, outcome: 'succeeded' | 'declined') =>
  fetch(`${fake.url}/_test/checkout/${id}/complete`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ outcome, wait: true }),
  });

describe('checkout sessions through the SDK', () => {
  it('creates a session shaped as the SDK types it, with a link to the hosted page', async () => {
    const session = await newSession();
    expect(session.id).toMatch(/^cs_test_/);
    expect(session).toMatchObject({
      object: 'checkout.session',
      amount_total: 12_345,
      currency: 'usd',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      livemode: false,
      client_reference_id: 'invoice-1042',
      customer_email: 'pat@example.test',
      metadata: { companyId: 'company-1', invoiceId: 'invoice-1' },
      url: `${fake.url}/pay/${session.id}`,
    });
    expect(session.payment_intent).toMatch(/^pi_test_/);
    const again = await sdk().checkout.sessions.retrieve(session.id);
    expect(again.id).toBe(session.id);
    const intent = await sdk().paymentIntents.retrieve(idOf(session.payment_intent) ?? '');
    expect(intent).toMatchObject({
      object: 'payment_intent',
      amount: 12_345,
      status: 'requires_payment_method',
    });
    const expanded = await sdk().checkout.sessions.retrieve(session.id, {
      expand: ['payment_intent'],
    });
    expect((expanded.payment_intent as Stripe.PaymentIntent).id).toBe(intent.id);
  });

  it('parses several nested line items and adds them up', async () => {
    const session = await sdk().checkout.sessions.create({
      mode: 'payment',
      success_url: 'http://127.0.0.1:9/ok',
      line_items: [
        {
          quantity: 2,
          price_data: { currency: 'usd', unit_amount: 1_000, product_data: { name: 'A' } },
        },
        {
          quantity: 1,
          price_data: { currency: 'usd', unit_amount: 250, product_data: { name: 'B' } },
        },
      ],
    });
    expect(session.amount_total).toBe(2_250);
  });

  it('refuses a wrong key with 401 and bad parameters with the param named', async () => {
    await expect(
      sdk('sk_test_wrong').checkout.sessions.retrieve('cs_test_x'),
    ).rejects.toMatchObject({
      type: 'StripeAuthenticationError',
      statusCode: 401,
    });
    await expect(
      sdk().checkout.sessions.create({ mode: 'payment', success_url: 'http://127.0.0.1:9/ok' }),
    ).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 400,
      param: 'line_items',
    });
    await expect(sdk().checkout.sessions.retrieve('cs_test_missing')).rejects.toMatchObject({
      statusCode: 404,
      code: 'resource_missing',
    });
  });

  it('answers 503 while down, at once', async () => {
    fake.store.down = true;
    const started = Date.now();
    await expect(newSession()).rejects.toMatchObject({ type: 'StripeAPIError', statusCode: 503 });
    expect(Date.now() - started).toBeLessThan(2_000);
  });

  it('expires an open session', async () => {
    const session = await newSession();
    const expired = await sdk().checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    await expect(sdk().checkout.sessions.expire(session.id)).rejects.toMatchObject({
      statusCode: 400,
    });
  });
});

describe('webhooks and refunds', () => {
  it('delivers signed checkout.session.completed and payment_intent.succeeded on success', async () => {
    const session = await newSession();
    const res = await complete(session.id, 'succeeded');
    expect(res.status).toBe(200);
    const types = received.map((r) => r.event.type).sort();
    expect(types).toEqual(['checkout.session.completed', 'payment_intent.succeeded']);
    const completed = received.find((r) => r.event.type === 'checkout.session.completed')!;
    expect(completed.event.id).toMatch(/^evt_/);
    expect(completed.event.livemode).toBe(false);
    expect(completed.event.api_version).toBeTruthy();
    expect(completed.header).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const object = completed.event.data.object as Stripe.Checkout.Session;
    expect(object).toMatchObject({ id: session.id, payment_status: 'paid', status: 'complete' });
    expect(object.metadata).toEqual({ companyId: 'company-1', invoiceId: 'invoice-1' });
    expect(await complete(session.id, 'succeeded').then((r) => r.status)).toBe(409);
  });

  it('delivers payment_intent.payment_failed on a decline and leaves the session open', async () => {
    const session = await newSession();
    await complete(session.id, 'declined');
    expect(received.map((r) => r.event.type)).toEqual(['payment_intent.payment_failed']);
    expect((await sdk().checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('retries a delivery that did not get a 2xx, and replays one on request', async () => {
    scripted.push(500, 503);
    const session = await newSession();
    await complete(session.id, 'succeeded');
    expect(received).toHaveLength(2);
    const list = (await (await fetch(`${fake.url}/_test/events`)).json()) as {
      data: { id: string; attempts: { status: number | null }[]; delivered: boolean }[];
    };
    const attempts = list.data.slice(-2).flatMap((e) => e.attempts.map((a) => a.status));
    expect(attempts.filter((s) => s !== 200)).toHaveLength(2);
    const first = received[0]!.event.id;
    await fetch(`${fake.url}/_test/events/${first}/redeliver`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ wait: true }),
    });
    expect(received.map((r) => r.event.id).filter((id) => id === first)).toHaveLength(2);
  });

  it('refunds part of a payment, then the rest, and refuses more', async () => {
    const session = await newSession(10_000);
    await complete(session.id, 'succeeded');
    received.length = 0;
    const intentId = idOf(session.payment_intent) ?? '';
    const part = await sdk().refunds.create({ payment_intent: intentId, amount: 2_500 });
    expect(part).toMatchObject({
      object: 'refund',
      amount: 2_500,
      status: 'succeeded',
      payment_intent: intentId,
    });
    expect(part.id).toMatch(/^re_/);
    expect((await sdk().refunds.retrieve(part.id)).amount).toBe(2_500);
    await expect(
      sdk().refunds.create({ payment_intent: intentId, amount: 9_000 }),
    ).rejects.toMatchObject({
      statusCode: 400,
      param: 'amount',
    });
    const rest = await sdk().refunds.create({ payment_intent: intentId });
    expect(rest.amount).toBe(7_500);
    await fake.store.settled();
    const charges = received
      .filter((r) => r.event.type === 'charge.refunded')
      .map((r) => r.event.data.object as Stripe.Charge);
    expect(charges.map((c) => c.amount_refunded)).toEqual([2_500, 10_000]);
    expect(charges[1]!.refunded).toBe(true);
    expect(charges[1]!.metadata).toEqual({ companyId: 'company-1', invoiceId: 'invoice-1' });
  });

  it('refuses to refund an unpaid payment', async () => {
    const session = await newSession();
    await expect(
      sdk().refunds.create({ payment_intent: idOf(session.payment_intent) ?? '' }),
    ).rejects.toMatchObject({ statusCode: 400, param: 'payment_intent' });
  });
});
