import { useEffect, useRef } from 'react';
import type { PublicInvoiceView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { formatCents } from '../../../lib/money';
import { useStartCheckout } from '../api/public-invoice';
import { checkoutProblemWords, type PayPanelState } from '../utils/pay-state';

/**
 * Paying: one button that hands the customer to the processor's secure page, and what happened
 * when they come back. Card details never touch this page or our server.
 */
export function PayPanel({
  token,
  view,
  state,
}: {
  token: string;
  view: PublicInvoiceView;
  state: PayPanelState;
}) {
  const checkout = useStartCheckout(token);
  const heading = useRef<HTMLHeadingElement>(null);
  // Coming back from the processor, the outcome is the first thing a screen reader hears.
  useEffect(() => {
    if (state.kind !== 'open' || state.cancelled) heading.current?.focus();
  }, [state]);
  const start = () =>
    checkout.mutate(undefined, {
      onSuccess: ({ url }) => window.location.assign(url),
    });
  return (
    <section
      aria-labelledby="pay-heading"
      className="flex flex-col gap-4 rounded-lg border-2 border-moss-700 bg-moss-50 p-4 sm:p-6"
      data-testid="pay-panel"
      data-state={state.kind}
    >
      <h2 id="pay-heading" ref={heading} tabIndex={-1} className="text-2xl font-bold">
        {headingOf(state)}
      </h2>
      {state.kind === 'paid' ? (
        <FormNotice>
          Thank you. {view.company.name} has received your payment and nothing more is owed on this
          invoice.
        </FormNotice>
      ) : null}
      {state.kind === 'confirming' ? (
        <p role="status">
          Thank you. We are waiting for the card company to confirm your payment; this page updates
          by itself in a few seconds.
        </p>
      ) : null}
      {state.kind === 'unconfirmed' ? (
        <p role="status">
          Your payment has not been confirmed yet. Please do not pay again: reload this page in a
          few minutes, or contact {view.company.name} if it still shows an amount to pay.
        </p>
      ) : null}
      {state.kind === 'open' ? (
        <>
          {state.cancelled ? (
            <FormAlert>
              The payment did not go through, and nothing was charged. You can try again with the
              same or another card.
            </FormAlert>
          ) : null}
          <p>You will go to a secure payment page to enter your card, then come back here.</p>
          {checkout.error ? (
            <FormAlert>{checkoutProblemWords(checkout.error, view.company.name)}</FormAlert>
          ) : null}
          <Button onClick={start} disabled={checkout.isPending || checkout.isSuccess}>
            {checkout.isPending || checkout.isSuccess
              ? 'Opening the payment page…'
              : `Pay ${formatCents(state.balanceCents, view.currency)} by card`}
          </Button>
        </>
      ) : null}
    </section>
  );
}

function headingOf(state: PayPanelState): string {
  if (state.kind === 'paid') return 'Paid in full';
  if (state.kind === 'confirming') return 'Confirming your payment';
  if (state.kind === 'unconfirmed') return 'Payment not confirmed yet';
  return state.cancelled ? 'Payment not completed' : 'Pay online';
}
