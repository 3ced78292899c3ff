// The customer's side of a Checkout Session: the hosted page at the session's `url`, the
// second-step page, and the way back to `success_url` or `cancel_url`.
import { Router } from 'express';
import type { Request, Response } from 'express';
import { approvePage, formatAmount, messagePage, payFormPage, testCards } from './hosted-page.js';
import type { FakeSession } from './objects.js';
import type { FakeStore } from './store.js';

const digitsOf = (text: string) => text.replace(/[\s-]/g, '');

/** The processor puts the session id where `{CHECKOUT_SESSION_ID}` stands in success_url. */
export function successUrlFor(session: FakeSession): string {
  return (session.success_url ?? '').replaceAll('{CHECKOUT_SESSION_ID}', session.id);
}

function field(req: Request, name: string): string {
  const value = (req.body as Record<string, unknown> | undefined)?.[name];
  return typeof value === 'string' ? value : '';
}

export function hostedRouter(store: FakeStore): Router {
  const router = Router();

  const html = (res: Response, status: number, page: string) => {
    res.status(status).type('html').setHeader('Cache-Control', 'no-store');
    res.send(page);
  };

  /** The page for a session that cannot take a payment any more, or undefined when it can. */
  const closedPage = (session: FakeSession | undefined): [number, string] | undefined => {
    if (!session)
      return [
        404,
        messagePage(
          'Payment link not found',
          'This payment link does not exist. Ask the business for a new one.',
        ),
      ];
    if (session.status === 'complete')
      return [
        200,
        messagePage('This payment is done', 'It was paid already; nothing more is needed.', {
          href: successUrlFor(session),
          label: 'Continue',
        }),
      ];
    if (session.status === 'expired')
      return [
        410,
        messagePage(
          'This payment link has expired',
          'Ask the business for a new link.',
          session.cancel_url ? { href: session.cancel_url, label: 'Go back' } : undefined,
        ),
      ];
    return undefined;
  };

  const formPage = (
    session: FakeSession,
    message: { kind: 'error' | 'ok'; text: string } | null,
    cardNumber = '',
  ) =>
    payFormPage({
      sessionId: session.id,
      description: store.extras.get(session.id)?.description ?? 'Payment',
      amountText: formatAmount(session.amount_total ?? 0, session.currency ?? 'usd'),
      customerEmail: session.customer_email,
      message,
      cardNumber,
      hasCancel: Boolean(session.cancel_url),
    });

  router.get('/:id', (req, res) => {
    const session = store.sessions.get(req.params.id);
    const closed = closedPage(session);
    if (closed || !session) return html(res, ...(closed ?? [404, '']));
    const extras = store.extras.get(session.id);
    if (extras?.awaitingApproval) return res.redirect(303, `/pay/${session.id}/confirm`);
    const decline = extras?.lastDecline ?? null;
    html(
      res,
      200,
      formPage(
        session,
        decline ? { kind: 'error', text: `${decline} Try another card, or go back.` } : null,
      ),
    );
  });

  router.post('/:id', (req, res) => {
    const session = store.sessions.get(req.params.id);
    const closed = closedPage(session);
    if (closed || !session) return html(res, ...(closed ?? [404, '']));
    const typed = field(req, 'cardNumber');
    const number = digitsOf(typed);
    if (number === digitsOf(testCards.succeeds)) {
      store.complete(session, 'succeeded');
      return res.redirect(303, successUrlFor(session));
    }
    if (number === digitsOf(testCards.declined)) {
      store.complete(session, 'declined');
      return html(
        res,
        402,
        formPage(
          session,
          {
            kind: 'error',
            text: 'The card was declined. No money was taken. Try another card, or go back.',
          },
          typed,
        ),
      );
    }
    if (number === digitsOf(testCards.secondStep)) {
      const extras = store.extras.get(session.id);
      if (extras) extras.awaitingApproval = true;
      return res.redirect(303, `/pay/${session.id}/confirm`);
    }
    const text = number
      ? 'That is not one of the test cards below. Nothing was charged.'
      : 'Enter a card number: one of the test cards below.';
    html(res, 400, formPage(session, { kind: 'error', text }, typed));
  });

  router.get('/:id/confirm', (req, res) => {
    const session = store.sessions.get(req.params.id);
    const closed = closedPage(session);
    if (closed || !session) return html(res, ...(closed ?? [404, '']));
    if (!store.extras.get(session.id)?.awaitingApproval)
      return res.redirect(303, `/pay/${session.id}`);
    const description = store.extras.get(session.id)?.description ?? 'Payment';
    html(
      res,
      200,
      approvePage(
        session.id,
        description,
        formatAmount(session.amount_total ?? 0, session.currency ?? 'usd'),
      ),
    );
  });

  router.post('/:id/confirm', (req, res) => {
    const session = store.sessions.get(req.params.id);
    const closed = closedPage(session);
    if (closed || !session) return html(res, ...(closed ?? [404, '']));
    if (!store.extras.get(session.id)?.awaitingApproval)
      return res.redirect(303, `/pay/${session.id}`);
    if (field(req, 'decision') === 'approve') {
      store.complete(session, 'succeeded');
      return res.redirect(303, successUrlFor(session));
    }
    store.complete(session, 'declined');
    res.redirect(303, `/pay/${session.id}`);
  });

  router.get('/:id/cancel', (req, res) => {
    const session = store.sessions.get(req.params.id);
    if (session?.cancel_url) return res.redirect(303, session.cancel_url);
    html(
      res,
      404,
      messagePage(
        'Nothing to go back to',
        'This payment has no page to return to. You can close this tab.',
      ),
    );
  });

  return router;
}
