// The hosted payment page as a browser uses it (plain form posts, 303 redirects), and the
// money formatting it shows.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatAmount, testCards } from './hosted-page.js';
import { startFakeProcessor } from './server.js';
import type { FakeProcessor } from './server.js';

let fake: FakeProcessor;

beforeAll(async () => {
  fake = await startFakeProcessor(0, { webhookUrl: null });
});
afterAll(async () => {
  await fake.stop();
});

function newSession(cancelUrl: string | null = 'http://127.0.0.1:9/back') {
  return fake.store.createSession({
    amountCents: 12_345,
    currency: 'usd',
    description: 'Invoice 7 · Northside Turf Co.',
    successUrl: 'http://127.0.0.1:9/paid?s={CHECKOUT_SESSION_ID}',
    cancelUrl,
    metadata: {},
    intentMetadata: {},
    clientReferenceId: null,
    customerEmail: 'pat@example.test',
  });
}

const post = (path: string, form: Record<string, string>) =>
  fetch(`${fake.url}${path}`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(form).toString(),
  });

describe('the hosted payment page', () => {
  it('shows the amount, the description, labelled fields and the test cards', async () => {
    const session = newSession();
    const res = await fetch(session.url!);
    const html = await res.text();
    expect(res.status).toBe(200);
    expect(html).toContain('Pay $123.45');
    expect(html).toContain('Invoice 7 · Northside Turf Co.');
    expect(html).toMatch(/<label for="card-number">Card number<\/label>/);
    expect(html).toContain('id="card-number"');
    expect(html).toContain('name="viewport"');
    expect(html).toContain(testCards.declined);
    expect(html).not.toMatch(/<script|<link /);
  });

  it('sends the success card back to success_url with the session id in place', async () => {
    const session = newSession();
    const res = await post(`/pay/${session.id}`, { cardNumber: testCards.succeeds });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`http://127.0.0.1:9/paid?s=${session.id}`);
    expect(session.status).toBe('complete');
    const after = await (await fetch(session.url!)).text();
    expect(after).toContain('This payment is done');
  });

  it('shows a decline, keeps the session open and lets the customer try again or go back', async () => {
    const session = newSession();
    const res = await post(`/pay/${session.id}`, { cardNumber: testCards.declined });
    const html = await res.text();
    expect(res.status).toBe(402);
    expect(html).toMatch(/role="alert">The card was declined/);
    expect(html).toContain('Go back without paying');
    expect(session.status).toBe('open');
    const back = await fetch(`${fake.url}/pay/${session.id}/cancel`, { redirect: 'manual' });
    expect(back.headers.get('location')).toBe('http://127.0.0.1:9/back');
    const retry = await post(`/pay/${session.id}`, { cardNumber: '4242-4242-4242-4242' });
    expect(retry.status).toBe(303);
  });

  it('asks for a second step with the 3155 card: approve pays, fail declines', async () => {
    const approved = newSession();
    const first = await post(`/pay/${approved.id}`, { cardNumber: testCards.secondStep });
    expect(first.headers.get('location')).toBe(`/pay/${approved.id}/confirm`);
    const page = await (await fetch(`${fake.url}/pay/${approved.id}/confirm`)).text();
    expect(page).toContain('Approve this test payment');
    expect(page).toMatch(/>Fail</);
    const done = await post(`/pay/${approved.id}/confirm`, { decision: 'approve' });
    expect(done.headers.get('location')).toBe(`http://127.0.0.1:9/paid?s=${approved.id}`);

    const failed = newSession();
    await post(`/pay/${failed.id}`, { cardNumber: testCards.secondStep });
    const back = await post(`/pay/${failed.id}/confirm`, { decision: 'fail' });
    expect(back.headers.get('location')).toBe(`/pay/${failed.id}`);
    const html = await (await fetch(`${fake.url}/pay/${failed.id}`)).text();
    expect(html).toContain('The card was declined');
    expect(failed.status).toBe('open');
  });

  it('refuses a card that is not a test card without charging', async () => {
    const session = newSession(null);
    const res = await post(`/pay/${session.id}`, { cardNumber: '5555 5555 5555 4444' });
    expect(res.status).toBe(400);
    expect(await res.text()).toContain('not one of the test cards');
    expect(session.status).toBe('open');
  });

  it('answers an unknown session with a page in words', async () => {
    const res = await fetch(`${fake.url}/pay/cs_test_nothing`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('Payment link not found');
  });
});

describe('formatAmount', () => {
  it('prints integer cents exactly', () => {
    expect(formatAmount(12_345, 'usd')).toBe('$123.45');
    expect(formatAmount(5, 'usd')).toBe('$0.05');
    expect(formatAmount(123_456_789, 'usd')).toBe('$1,234,567.89');
  });
});
