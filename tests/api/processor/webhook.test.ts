// POST /api/webhooks/processor on the real route and database: the signature and its age are
// checked on the raw bytes, each event id is recorded once, and a replay or ten concurrent
// copies run the handler once. No cookie and no CSRF token are sent: the signature is the
// only credential.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { registerProcessorEventHandler, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { eventPayload, newEventId, signatureFor, webhookPath } from './processor-fixtures.js';

const { app, sequelize } = testApp();
const countedType = 'seamwright_test.counted';
const failingType = 'seamwright_test.fails_once';
const seen: string[] = [];
let failNext = true;

const unregister = [
  registerProcessorEventHandler(countedType, async (event) => {
    // A pause inside the transaction, so concurrent copies really overlap.
    await new Promise((resolve) => setTimeout(resolve, 30));
    seen.push(event.id);
  }),
  registerProcessorEventHandler(failingType, (event) => {
    if (failNext) {
      failNext = false;
      return Promise.reject(new Error('the handler failed this time'));
    }
    seen.push(event.id);
    return Promise.resolve();
  }),
];

afterAll(() => {
  for (const off of unregister) off();
});

beforeEach(() => {
  seen.length = 0;
});

function deliver(payload: string, signature: string | null, contentType = 'application/json') {
  const req = request(app).post(webhookPath).set('content-type', contentType);
  if (signature !== null) req.set('stripe-signature', signature);
  return req.send(payload);
}

async function rowsFor(eventId: string) {
  return selectRows<{
    type: string;
    handled: number;
    company_id: string | null;
    object_id: string;
  }>(
    sequelize,
    'SELECT type, handled, company_id, object_id FROM processor_events WHERE event_id = ?',
    [eventId],
  );
}

describe('POST /api/webhooks/processor', () => {
  it('records a validly signed event once and runs its handler, with no session or CSRF token', async () => {
    const companyId = randomUUID();
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'cs_test_1', metadata: { companyId } }, id);
    const res = await deliver(payload, signatureFor(payload)).expect(200);
    expect(res.body).toEqual({ data: { received: true, eventId: id, outcome: 'handled' } });
    expect(seen).toEqual([id]);
    expect(await rowsFor(id)).toEqual([
      { type: countedType, handled: 1, company_id: companyId, object_id: 'cs_test_1' },
    ]);
  });

  it('refuses a signature made with another secret: 400 problem+json, nothing recorded', async () => {
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'x' }, id);
    const res = await deliver(payload, signatureFor(payload, { secret: 'whsec_someone_else' }));
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(res.body).toMatchObject({
      code: 'BAD_REQUEST',
      detail: expect.stringMatching(/does not match/),
    });
    expect(seen).toEqual([]);
    expect(await rowsFor(id)).toEqual([]);
  });

  it('refuses a body changed after signing', async () => {
    const payload = eventPayload(countedType, { id: 'x', amount: 100 });
    const res = await deliver(payload.replace('100', '999'), signatureFor(payload));
    expect(res.status).toBe(400);
    expect(seen).toEqual([]);
  });

  it('refuses a signed timestamp older than the 300 s tolerance', async () => {
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'x' }, id);
    const stale = Math.floor(Date.now() / 1000) - 301;
    const res = await deliver(payload, signatureFor(payload, { timestamp: stale }));
    expect(res.status).toBe(400);
    expect(res.body.detail).toMatch(/older than 300 s/);
    expect(await rowsFor(id)).toEqual([]);
  });

  it('answers a missing signature or a malformed signed body with 400, never 500', async () => {
    const payload = eventPayload(countedType, { id: 'x' });
    expect((await deliver(payload, null)).status).toBe(400);
    expect((await deliver(payload, 'garbage')).status).toBe(400);
    const notJson = '{"id": "evt_broken", "type":';
    const res = await deliver(notJson, signatureFor(notJson));
    expect(res.status).toBe(400);
    expect(res.body.detail).toMatch(/not valid JSON/);
    const notEvent = JSON.stringify({ hello: 'world' });
    expect((await deliver(notEvent, signatureFor(notEvent))).status).toBe(400);
    expect(seen).toEqual([]);
  });

  it('reads the raw bytes whatever the content type says', async () => {
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'x' }, id);
    await deliver(payload, signatureFor(payload), 'text/plain').expect(200);
    expect(seen).toEqual([id]);
  });

  it('records a replayed event once and runs its handler once', async () => {
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'x' }, id);
    const first = await deliver(payload, signatureFor(payload)).expect(200);
    // The processor signs each delivery afresh: a new timestamp, the same bytes.
    const again = await deliver(payload, signatureFor(payload)).expect(200);
    expect(first.body.data.outcome).toBe('handled');
    expect(again.body.data.outcome).toBe('duplicate');
    expect(seen).toEqual([id]);
    expect(await rowsFor(id)).toHaveLength(1);
  });

  it('runs the handler once for ten concurrent copies of one event', async () => {
    const id = newEventId();
    const payload = eventPayload(countedType, { id: 'x' }, id);
    const answers = await Promise.all(
      Array.from({ length: 10 }, () => deliver(payload, signatureFor(payload))),
    );
    expect(answers.map((r) => r.status)).toEqual(Array.from({ length: 10 }, () => 200));
    expect(answers.filter((r) => r.body.data.outcome === 'handled')).toHaveLength(1);
    expect(seen).toEqual([id]);
    expect(await rowsFor(id)).toHaveLength(1);
  });

  it('records nothing when the handler fails, so the redelivery is handled', async () => {
    const id = newEventId();
    const payload = eventPayload(failingType, { id: 'x' }, id);
    const failed = await deliver(payload, signatureFor(payload));
    expect(failed.status).toBe(500);
    expect(await rowsFor(id)).toEqual([]);
    await deliver(payload, signatureFor(payload)).expect(200);
    expect(seen).toEqual([id]);
    expect(await rowsFor(id)).toHaveLength(1);
  });

  it('records and acknowledges an event type nobody handles', async () => {
    const id = newEventId();
    const payload = eventPayload(
      'customer.created',
      { id: 'cus_1', metadata: { companyId: 'not-a-uuid' } },
      id,
    );
    const res = await deliver(payload, signatureFor(payload)).expect(200);
    expect(res.body.data.outcome).toBe('recorded');
    expect(await rowsFor(id)).toEqual([
      { type: 'customer.created', handled: 0, company_id: null, object_id: 'cus_1' },
    ]);
  });
});
