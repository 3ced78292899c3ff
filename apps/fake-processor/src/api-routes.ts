// The REST endpoints the official SDK calls: Checkout Sessions, the PaymentIntent behind each,
// and Refunds. Every request needs the configured secret key; while the fake is "down" they
// answer 503 as an outage would.
import { Router } from 'express';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { readNewSession } from './checkout-params.js';
import { FakeApiError, invalid, missing, sendApiError } from './errors.js';
import { newId } from './ids.js';
import { idOf } from './objects.js';
import { expandsOf, metadataOf, optionalInteger, optionalString } from './params.js';
import type { Params } from './params.js';
import type { FakeStore } from './store.js';

function keyOf(req: Request): string | null {
  const header = req.get('authorization') ?? '';
  const bearer = /^Bearer (.+)$/i.exec(header);
  if (bearer) return bearer[1]!.trim();
  // `curl -u sk_test_…:` sends the key as the Basic user name.
  const basic = /^Basic (.+)$/i.exec(header);
  if (basic) return Buffer.from(basic[1]!, 'base64').toString('utf8').split(':')[0] ?? null;
  return null;
}

function guard(store: FakeStore): RequestHandler {
  return (req, res, next) => {
    res.setHeader('Request-Id', newId('req'));
    if (store.down) {
      // The SDK reads this header and does not retry, so "down" is seen at once.
      res.setHeader('Stripe-Should-Retry', 'false');
      sendApiError(
        res,
        new FakeApiError(503, 'api_error', 'The local processor fake is down (POST /_test/up).'),
      );
      return;
    }
    const key = keyOf(req);
    if (key !== store.config.apiKey) {
      const message = key
        ? `Invalid API Key provided: ${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`
        : 'You did not provide an API key. Send it as a Bearer token in the Authorization header.';
      sendApiError(res, new FakeApiError(401, 'authentication_error', message));
      return;
    }
    next();
  };
}

/** The same Idempotency-Key on a POST gets the first answer again (the SDK retries with one). */
function idempotent(seen: Map<string, { status: number; body: unknown }>): RequestHandler {
  return (req, res, next) => {
    const key = req.method === 'POST' ? req.get('idempotency-key') : undefined;
    if (!key) return next();
    const earlier = seen.get(`${req.path} ${key}`);
    if (earlier) {
      res.setHeader('Idempotent-Replayed', 'true');
      res.status(earlier.status).json(earlier.body);
      return;
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      if (res.statusCode < 500) seen.set(`${req.path} ${key}`, { status: res.statusCode, body });
      return json(body);
    };
    next();
  };
}

const body = (req: Request): Params => (req.body ?? {}) as Params;
const query = (req: Request): Params => req.query;

export function apiRouter(store: FakeStore): Router {
  const router = Router();
  router.use(guard(store), idempotent(new Map()));

  const sessionOr404 = (id: string) => {
    const session = store.sessions.get(id);
    if (!session) throw missing('checkout.session', id, 'session');
    return session;
  };

  const sessionView = (id: string, expand: string[]) => {
    const session = sessionOr404(id);
    return expand.includes('payment_intent')
      ? { ...session, payment_intent: store.intentOf(session) }
      : session;
  };

  router.post('/checkout/sessions', (req, res) => {
    const session = store.createSession(readNewSession(body(req)));
    res.json(sessionView(session.id, expandsOf(body(req))));
  });

  router.get('/checkout/sessions/:id', (req, res) => {
    res.json(sessionView(req.params.id, expandsOf(query(req))));
  });

  router.post('/checkout/sessions/:id/expire', (req, res) => {
    const session = sessionOr404(req.params.id);
    if (session.status !== 'open')
      throw invalid(
        `Only an open session can be expired; this one is ${session.status}.`,
        undefined,
        'checkout_session_not_open',
      );
    session.status = 'expired';
    store.emit('checkout.session.expired', session);
    res.json(session);
  });

  router.get('/payment_intents/:id', (req, res) => {
    const intent = store.paymentIntents.get(req.params.id);
    if (!intent) throw missing('payment_intent', req.params.id, 'intent');
    res.json(intent);
  });

  router.post('/refunds', (req, res) => {
    const params = body(req);
    const intentId = optionalString(params, 'payment_intent');
    const chargeId = optionalString(params, 'charge');
    const charge = chargeId ? store.charges.get(chargeId) : undefined;
    if (chargeId && !charge) throw missing('charge', chargeId, 'charge');
    const id = intentId ?? (charge ? (idOf(charge.payment_intent) ?? '') : null);
    if (!id)
      throw invalid(
        'Missing required param: payment_intent.',
        'payment_intent',
        'parameter_missing',
      );
    const intent = store.paymentIntents.get(id);
    if (!intent) throw missing('payment_intent', id, 'payment_intent');
    const paid = intent.latest_charge
      ? store.charges.get(idOf(intent.latest_charge) ?? '')
      : undefined;
    if (intent.status !== 'succeeded' || !paid)
      throw invalid(
        `PaymentIntent ${id} has no successful payment to refund.`,
        'payment_intent',
        'charge_not_refundable',
      );
    const left = paid.amount - paid.amount_refunded;
    if (left <= 0)
      throw invalid(
        `Charge ${paid.id} has already been refunded.`,
        undefined,
        'charge_already_refunded',
      );
    const amount = optionalInteger(params, 'amount') ?? left;
    if (amount < 1) throw invalid('The refund amount must be a positive integer.', 'amount');
    if (amount > left)
      throw invalid(
        `Refund amount (${amount}) is greater than the amount left to refund (${left}).`,
        'amount',
        'amount_too_large',
      );
    const reason = optionalString(params, 'reason');
    const reasons = ['duplicate', 'fraudulent', 'requested_by_customer'];
    if (reason !== null && !reasons.includes(reason))
      throw invalid(`Invalid reason: must be one of ${reasons.join(', ')}`, 'reason');
    const metadata = metadataOf(params.metadata);
    res.json(store.refund(intent, amount, reason, metadata));
  });

  router.get('/refunds/:id', (req, res) => {
    const refund = store.refunds.get(req.params.id);
    if (!refund) throw missing('refund', req.params.id, 'id');
    res.json(refund);
  });

  router.use((req, _res, next) => {
    next(
      new FakeApiError(
        404,
        'invalid_request_error',
        `Unrecognized request URL (${req.method}: /v1${req.path}). The local processor fake answers checkout sessions, payment intents and refunds only.`,
      ),
    );
  });
  router.use((error: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (error instanceof FakeApiError) return sendApiError(res, error);
    next(error);
  });
  return router;
}
