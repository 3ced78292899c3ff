// Paying an invoice online, end to end through the real SDK and the suite's processor fake:
// the customer's checkout, the fake's signed webhook landing on this file's app on a real port,
// the payment recorded once (replays change nothing), a declined card and a processor that is
// down recording nothing, and the refusals of the public checkout route.
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import type { Client } from '../../fixtures/client.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { testProcessor } from '../../fixtures/test-env.js';
import { acceptedJob, getInvoice, sentDeposit } from './invoice-fixtures.js';

const { app, sequelize } = testApp();
let server: Server;

async function fake(path: string, body: unknown = {}): Promise<Response> {
  return fetch(`${testProcessor.url}${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
}

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
  await fake('/_test/up');
  await fake('/_test/config', { webhookUrl: null });
  await new Promise((resolve) => server.close(resolve));
});

/** The checkout session's id in the hosted page's address. */
function sessionIdOf(url: string): string {
  const match = /(cs_test_[A-Za-z0-9]+)/.exec(url);
  if (!match?.[1]) throw new Error(`no session id in ${url}`);
  return match[1];
}

async function paymentRows(invoiceId: string) {
  return selectRows<{ method: string; amount_cents: number; processor_payment_intent_id: string }>(
    sequelize,
    'SELECT method, amount_cents, processor_payment_intent_id FROM payments WHERE invoice_id = ?',
    [invoiceId],
  );
}

describe('paying an invoice online', () => {
  let team: Team;
  let customer: Client;

  beforeAll(async () => {
    team = await signUpTeam(app);
    customer = await newClient(app);
  });

  it('records a card payment from the signed webhook, once, and the invoice is paid', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);

    const checkout = await customer.post(`/api/public/invoices/${token}/checkout`, {}).expect(200);
    const url = checkout.body.data.url as string;
    expect(url.startsWith(testProcessor.url)).toBe(true);
    // Nothing is recorded when the checkout starts, only when the processor says it was paid.
    expect(await paymentRows(invoice.id)).toHaveLength(0);

    const done = await fake(`/_test/checkout/${sessionIdOf(url)}/complete`, {
      outcome: 'succeeded',
      wait: true,
    });
    expect(done.status).toBe(200);
    const { data } = (await done.json()) as { data: { redirectUrl: string; events: string[] } };
    // The processor sends the customer back to the pay page with the balance they started from.
    expect(data.redirectUrl).toContain(`/i/${token}?checkout=done&owed=${job.depositCents}`);

    const paid = await getInvoice(team.bookkeeper.client, invoice.id);
    expect(paid).toMatchObject({ status: 'paid', paidCents: job.depositCents, balanceCents: 0 });
    const rows = await paymentRows(invoice.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ method: 'card', amount_cents: job.depositCents });

    // Every event of the payment delivered again: still one payment.
    for (const id of data.events) await fake(`/_test/events/${id}/redeliver`, { wait: true });
    expect(await paymentRows(invoice.id)).toHaveLength(1);
    const view = await customer.get(`/api/public/invoices/${token}`).expect(200);
    expect(view.body.data).toMatchObject({ status: 'paid', balanceCents: 0 });

    // Nothing left to pay: no second checkout.
    const again = await customer.post(`/api/public/invoices/${token}/checkout`, {}).expect(409);
    expect(again.headers['content-type']).toMatch(/^application\/problem\+json/);
  });

  it('leaves the invoice unpaid when the card is declined', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    const checkout = await customer.post(`/api/public/invoices/${token}/checkout`, {}).expect(200);
    const done = await fake(
      `/_test/checkout/${sessionIdOf(String(checkout.body.data.url))}/complete`,
      {
        outcome: 'declined',
        wait: true,
      },
    );
    expect(done.status).toBe(200);
    expect(await paymentRows(invoice.id)).toHaveLength(0);
    expect(await getInvoice(team.bookkeeper.client, invoice.id)).toMatchObject({
      status: 'sent',
      paidCents: 0,
      balanceCents: job.depositCents,
    });
  });

  it('answers 503 and records nothing while the processor is down', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    await fake('/_test/down');
    try {
      const res = await customer.post(`/api/public/invoices/${token}/checkout`, {}).expect(503);
      expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
      expect(res.body.code).toBe('PROCESSOR_UNAVAILABLE');
    } finally {
      await fake('/_test/up');
    }
    expect(await paymentRows(invoice.id)).toHaveLength(0);
    expect((await getInvoice(team.bookkeeper.client, invoice.id)).status).toBe('sent');
  });

  it('lets the owner refund a card payment through the processor, recorded once', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    const checkout = await customer.post(`/api/public/invoices/${token}/checkout`, {}).expect(200);
    await fake(`/_test/checkout/${sessionIdOf(String(checkout.body.data.url))}/complete`, {
      outcome: 'succeeded',
      wait: true,
    });
    const paid = await getInvoice(team.bookkeeper.client, invoice.id);
    const payment = paid.payments[0]!;
    const refunds = `/api/invoices/${invoice.id}/payments/${payment.id}/refunds`;

    // Owner only; more than was paid is refused naming the field; nothing is recorded.
    await team.bookkeeper.client.post(refunds, { amountCents: 100, reason: 'x' }).expect(403);
    const tooMuch = await team.owner.client
      .post(refunds, { amountCents: job.depositCents + 1, reason: 'Too much' })
      .expect(409);
    expect(tooMuch.body.errors[0].path).toBe('amountCents');
    await fake('/_test/down');
    try {
      await team.owner.client.post(refunds, { amountCents: 100, reason: 'Down' }).expect(503);
    } finally {
      await fake('/_test/up');
    }
    expect((await getInvoice(team.owner.client, invoice.id)).refundedCents).toBe(0);

    const res = await team.owner.client
      .post(refunds, { amountCents: 1_000, reason: 'Two pallets of stone were not needed' })
      .expect(201);
    expect(res.body.data).toMatchObject({ amountCents: 1_000, paymentId: payment.id });
    await fake('/_test/settle');
    // The processor's refund.created webhook arrived too (and again when replayed): one refund.
    const events = (await (
      await fetch(`${testProcessor.url}/_test/events?type=refund.created`)
    ).json()) as { data: { id: string; objectId: string }[] };
    const mine = events.data.find((e) => e.objectId === res.body.data.processorRefundId)!;
    await fake(`/_test/events/${mine.id}/redeliver`, { wait: true });
    const rows = await selectRows<{ amount_cents: number }>(
      sequelize,
      'SELECT amount_cents FROM refunds WHERE invoice_id = ?',
      [invoice.id],
    );
    expect(rows.map((r) => Number(r.amount_cents))).toEqual([1_000]);
    const after = await getInvoice(team.owner.client, invoice.id);
    // What was given back is owed again unless a credit note says otherwise.
    expect(after).toMatchObject({
      refundedCents: 1_000,
      balanceCents: 1_000,
      status: 'partly_paid',
    });
    expect(after.payments[0]!.refundedCents).toBe(1_000);
  });

  it('refuses unknown and tampered links with 404', async () => {
    await customer.post(`/api/public/invoices/${'x'.repeat(43)}/checkout`, {}).expect(404);
    await customer.post('/api/public/invoices/not-a-token/checkout', {}).expect(404);
  });
});
