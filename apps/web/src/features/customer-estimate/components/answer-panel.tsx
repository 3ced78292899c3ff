import { useEffect, useRef } from 'react';
import type { PublicEstimateView } from '@seamwright/shared';
import type { EstimatePageState } from '../utils/answer-state';
import { formatMoment } from '../../../lib/plain-words';

/** What the page says once the estimate has an answer (or was replaced by a newer version). */
export function AnswerPanel({
  state,
  view,
  takeFocus = false,
}: {
  state: Exclude<EstimatePageState, { kind: 'open' }>;
  view: PublicEstimateView;
  /** Just answered on this page: the form is gone, so focus (and the screen) move here. */
  takeFocus?: boolean;
}) {
  const panel = useRef<HTMLElement>(null);
  useEffect(() => {
    if (!takeFocus) return;
    panel.current?.focus();
    panel.current?.scrollIntoView({ block: 'start' });
  }, [takeFocus]);
  const company = view.company.name;
  const contact = [view.company.phone, view.company.email].filter(Boolean).join(' or ');
  return (
    <section
      ref={panel}
      tabIndex={-1}
      aria-labelledby="answer-heading"
      aria-live="polite"
      className="rounded-lg border-2 border-moss-700 bg-moss-50 p-4 sm:p-6"
      data-testid="answer-panel"
    >
      {state.kind === 'accepted' ? (
        <>
          <h2 id="answer-heading" className="text-2xl font-bold">
            Thank you: the estimate is accepted
          </h2>
          <p className="mt-2">
            Accepted on <strong data-testid="accepted-at">{formatMoment(state.at)}</strong>.{' '}
            {company} has been told and will be in touch to plan the work.
          </p>
          {state.cancellationEndsAt ? (
            <p className="mt-2" data-testid="cancellation-ends">
              You may still cancel until <strong>{formatMoment(state.cancellationEndsAt)}</strong>.
            </p>
          ) : null}
        </>
      ) : state.kind === 'declined' ? (
        <>
          <h2 id="answer-heading" className="text-2xl font-bold">
            The estimate is declined
          </h2>
          <p className="mt-2">
            Declined on <strong>{formatMoment(state.at)}</strong>. {company} has been told. If you
            change your mind, ask them for a new estimate.
          </p>
        </>
      ) : (
        <>
          <h2 id="answer-heading" className="text-2xl font-bold">
            There is a newer version of this estimate
          </h2>
          <p className="mt-2">
            {company} changed this estimate and sent a new one. Look for the newer e-mail, or ask
            them to send it again.
          </p>
        </>
      )}
      {contact ? (
        <p className="mt-2">
          Questions? Contact {company} at {contact}.
        </p>
      ) : null}
    </section>
  );
}
