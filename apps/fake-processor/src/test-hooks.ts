// Hooks for scripts and tests, under /_test (never part of the processor's API): finish a
// checkout without the page, list and replay deliveries, take the fake down and up, and
// point its webhooks elsewhere at run time.
import express, { Router } from 'express';
import type { Request, Response } from 'express';
import { successUrlFor } from './hosted-routes.js';
import type { EventRecord } from './objects.js';
import type { FakeStore } from './store.js';

const problem = (res: Response, status: number, message: string) =>
  res.status(status).json({ error: { type: 'invalid_request_error', message } });

function summary(record: EventRecord) {
  const object = record.event.data.object;
  return {
    id: record.event.id,
    type: record.event.type,
    created: record.event.created,
    objectId: object.id,
    metadata: object.metadata,
    delivered: record.delivered,
    attempts: record.attempts,
  };
}

function bodyOf(req: Request): Record<string, unknown> {
  return (req.body ?? {}) as Record<string, unknown>;
}

export function testRouter(store: FakeStore): Router {
  const router = Router();
  router.use(express.json());

  // The exact contract scripts rely on (issue 10): { outcome: "succeeded" | "declined" }.
  router.post('/checkout/:sessionId/complete', async (req, res) => {
    const session = store.sessions.get(req.params.sessionId);
    if (!session) return problem(res, 404, `No such checkout.session: '${req.params.sessionId}'`);
    const outcome = bodyOf(req).outcome;
    if (outcome !== 'succeeded' && outcome !== 'declined')
      return problem(res, 400, 'outcome must be "succeeded" or "declined"');
    if (session.status !== 'open')
      return problem(res, 409, `The session is ${session.status ?? 'closed'}, not open`);
    const before = store.events.length;
    store.complete(session, outcome);
    const events = store.events.slice(before).map((record) => record.event.id);
    // `wait: true` answers after the deliveries have finished (or given up).
    if (bodyOf(req).wait === true) await store.settled();
    res.json({
      data: {
        session,
        redirectUrl: outcome === 'succeeded' ? successUrlFor(session) : null,
        events,
      },
    });
  });

  router.get('/events', (req, res) => {
    const type = typeof req.query.type === 'string' ? req.query.type : undefined;
    const records = store.events.filter((record) => !type || record.event.type === type);
    res.json({ data: records.map(summary) });
  });

  router.get('/events/:id', (req, res) => {
    const record = store.events.find((r) => r.event.id === req.params.id);
    if (!record) return problem(res, 404, `No such event: '${req.params.id}'`);
    res.json({ data: { ...summary(record), event: record.event, payload: record.payload } });
  });

  router.post('/events/:id/redeliver', async (req, res) => {
    const record = store.events.find((r) => r.event.id === req.params.id);
    if (!record) return problem(res, 404, `No such event: '${req.params.id}'`);
    record.delivered = false;
    store.startDelivery(record);
    if (bodyOf(req).wait === true) await store.settled();
    res.status(202).json({ data: summary(record) });
  });

  router.post('/settle', async (_req, res) => {
    await store.settled();
    res.json({ data: { events: store.events.length } });
  });

  router.post('/down', (_req, res) => {
    store.down = true;
    res.json({ data: { down: true } });
  });
  router.post('/up', (_req, res) => {
    store.down = false;
    res.json({ data: { down: false } });
  });

  router.post('/config', (req, res) => {
    const body = bodyOf(req);
    if ('webhookUrl' in body) {
      if (body.webhookUrl !== null && typeof body.webhookUrl !== 'string')
        return problem(res, 400, 'webhookUrl must be a URL or null');
      store.config.webhookUrl = body.webhookUrl;
    }
    if ('retryDelaysMs' in body) {
      const delays = body.retryDelaysMs;
      if (
        !Array.isArray(delays) ||
        !delays.every((d) => Number.isInteger(d) && d >= 0 && d <= 60_000)
      )
        return problem(res, 400, 'retryDelaysMs must be a list of whole milliseconds');
      store.config.retryDelaysMs = delays as number[];
    }
    res.json({
      data: { webhookUrl: store.config.webhookUrl, retryDelaysMs: store.config.retryDelaysMs },
    });
  });

  return router;
}
