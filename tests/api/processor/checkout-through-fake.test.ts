// The product's processor calls against the suite's running fake (tests/api/global-setup.ts):
// a checkout session made through createCheckoutSession, finished with the fake's test hook,
// and its webhooks arriving at this file's app listening on a real port; refunds; and the
// processor down or unreachable answered as the typed error callers turn into a 503.
import { randomUUID } from 'node:crypto';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createCheckoutSession,
  loadEnv,
  processorProblem,
  ProcessorRefusedError,
  ProcessorUnavailableError,
  refundPayment,
  registerProcessorEventHandler,
  selectRows,
} from '@seamwright/api';
import type { ProcessorConfig } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { testProcessor } from '../../fixtures/test-env.js';

const { app, sequelize } = testApp();
const config: ProcessorConfig = loadEnv().processor;
const completedSessions: { id: string; metadata: Stripe.Metadata | null }[] = [];
let server: Server;

const fake = (path: string, body: unknown = {}) =>
  fetch(`${testProcessor.url}${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });

const unregister = registerProcessorEventHandler('checkout.session.completed', (event) => {
  const session = event.data.object as Stripe.Checkout.Session;
  completedSessions.push({ id: session.id, metadata: session.metadata });
  return Promise.resolve();
});

beforeAll(async () => {
  server = await new Promise<Server>((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const { port } = server.address() as AddressInfo;
  const res = await fake('/_test/config', {
    webhookUrl: `http://127.0.0.1:${port}/api/webhooks/processor`,
  });
  expect(res.status).toBe(200);
});

afterAll(async () => {
  unregister();
  await fake('/_test/up');
  await fake('/_test/config', { webhookUrl: null });
  await new Promise((resolve) => server.close(resolve));
});

async function eventsOf(objectId: string) {
  return selectRows<{ type: string; company_id: string | null }>(
    sequelize,
    'SELECT type, company_id FROM processor_events WHERE object_id = ? ORDER BY type',
    [objectId],
  );
}

function newSession(companyId: string, amountCents = 12_345) {
  return createCheckoutSession(config, {
    amountCents,
    currency: 'usd',
    description: 'Invoice 1042 · Northside Turf Co.',
    customerEmail: 'pat@example.test',
    successUrl: 'http://127.0.0.1:9/i/token/paid?session={CHECKOUT_SESSION_ID}',
    cancelUrl: 'http://127.0.0.1:9/i/token',
    metadata: { companyId, invoiceId: 'invoice-1042' },
  });
}

describe('checkout through the processor fake', () => {
  it('makes a session whose completion arrives as signed webhooks and is recorded once', async () => {
    const companyId = randomUUID();
    const session = await newSession(companyId);
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.url).toBe(`${testProcessor.url}/pay/${session.id}`);
    expect(session.paymentIntentId).toMatch(/^pi_test_/);

    const done = await fake(`/_test/checkout/${session.id}/complete`, {
      outcome: 'succeeded',
      wait: true,
    });
    expect(done.status).toBe(200);
    expect(await eventsOf(session.id)).toEqual([
      { type: 'checkout.session.completed', company_id: companyId },
    ]);
    expect(await eventsOf(session.paymentIntentId!)).toEqual([
      { type: 'payment_intent.succeeded', company_id: companyId },
    ]);
    expect(completedSessions.filter((s) => s.id === session.id)).toEqual([
      { id: session.id, metadata: { companyId, invoiceId: 'invoice-1042' } },
    ]);

    // The fake's log shows each delivery answered 200 the first time.
    const log = (await (await fetch(`${testProcessor.url}/_test/events`)).json()) as {
      data: { id: string; objectId: string; delivered: boolean; attempts: { status: number }[] }[];
    };
    const mine = log.data.filter((e) => e.objectId === session.id);
    expect(mine.map((e) => [e.delivered, e.attempts.map((a) => a.status)])).toEqual([
      [true, [200]],
    ]);

    // A replay from the processor changes nothing.
    await fake(`/_test/events/${mine[0]!.id}/redeliver`, { wait: true });
    expect(await eventsOf(session.id)).toHaveLength(1);
    expect(completedSessions.filter((s) => s.id === session.id)).toHaveLength(1);
  });

  it('records a declined payment as payment_intent.payment_failed and nothing completed', async () => {
    const session = await newSession(randomUUID());
    await fake(`/_test/checkout/${session.id}/complete`, { outcome: 'declined', wait: true });
    expect(await eventsOf(session.paymentIntentId!)).toMatchObject([
      { type: 'payment_intent.payment_failed' },
    ]);
    expect(completedSessions.some((s) => s.id === session.id)).toBe(false);
  });

  it('refunds part of a payment and then the rest through the SDK, and refuses more', async () => {
    const companyId = randomUUID();
    const session = await newSession(companyId, 10_000);
    await fake(`/_test/checkout/${session.id}/complete`, { outcome: 'succeeded', wait: true });
    const paymentIntentId = session.paymentIntentId!;
    const part = await refundPayment(config, { paymentIntentId, amountCents: 2_500 });
    expect(part).toMatchObject({ amountCents: 2_500, status: 'succeeded' });
    expect(part.id).toMatch(/^re_/);
    await expect(refundPayment(config, { paymentIntentId, amountCents: 8_000 })).rejects.toSatisfy(
      (error) => error instanceof ProcessorRefusedError && error.param === 'amount',
    );
    const rest = await refundPayment(config, { paymentIntentId });
    expect(rest.amountCents).toBe(7_500);
    await fake('/_test/settle');
    const refundEvents = await selectRows<{ n: number }>(
      sequelize,
      "SELECT COUNT(*) AS n FROM processor_events WHERE type = 'charge.refunded' AND company_id = ?",
      [companyId],
    );
    expect(Number(refundEvents[0]?.n)).toBe(2);
  });

  it('throws ProcessorUnavailableError at once while the processor is down, mapped to a 503', async () => {
    await fake('/_test/down');
    try {
      const started = Date.now();
      const error: unknown = await newSession(randomUUID()).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(ProcessorUnavailableError);
      expect(Date.now() - started).toBeLessThan(3_000);
      const problem = processorProblem(error);
      expect(problem?.code).toBe('PROCESSOR_UNAVAILABLE');
      expect(problem?.message).toMatch(/nothing was charged or recorded/);
    } finally {
      await fake('/_test/up');
    }
  });

  it('throws ProcessorUnavailableError when nothing listens where the processor should be', async () => {
    const nowhere: ProcessorConfig = {
      ...config,
      api: { host: '127.0.0.1', port: 9, protocol: 'http' },
      maxNetworkRetries: 0,
    };
    await expect(
      createCheckoutSession(nowhere, {
        amountCents: 5_000,
        currency: 'usd',
        description: 'x',
        successUrl: 'http://127.0.0.1:9/ok',
        cancelUrl: 'http://127.0.0.1:9/back',
        metadata: {},
      }),
    ).rejects.toBeInstanceOf(ProcessorUnavailableError);
  });

  it('reports a wrong key as refused, not as down', async () => {
    const wrongKey: ProcessorConfig = { ...config, secretKey: 'sk_test_not_the_right_key' };
    await expect(newSessionWith(wrongKey)).rejects.toSatisfy(
      (error) => error instanceof ProcessorRefusedError && error.status === 401,
    );
  });
});

function newSessionWith(other: ProcessorConfig) {
  return createCheckoutSession(other, {
    amountCents: 5_000,
    currency: 'usd',
    description: 'x',
    successUrl: 'http://127.0.0.1:9/ok',
    cancelUrl: 'http://127.0.0.1:9/back',
    metadata: {},
  });
}
