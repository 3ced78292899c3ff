import { useState } from 'react';
import type { PublicEstimateView } from '@seamwright/shared';
import { buttonClasses } from '../../../components/ui/button';
import { useDocumentTitle } from '../../../lib/page-title';
import { pageStateOf, type DeadLink, type EstimatePageState } from '../utils/answer-state';
import { AcceptForm } from './accept-form';
import { AnswerPanel } from './answer-panel';
import { AreaPlans } from './area-plans';
import { DeadLinkCard } from './dead-link-card';
import { DeclineForm } from './decline-form';
import { EstimateHeader } from './estimate-header';
import { CancellationNotice, NotesAndCautions } from './small-print';
import { TierPrice } from './tier-price';

/**
 * The homeowner's estimate, opened from the e-mail's link on a phone: who, where, the plan,
 * the price of each option, the small print, and the answer (accept or decline) at the end.
 */
export function CustomerEstimatePage({ token, view }: { token: string; view: PublicEstimateView }) {
  // The answer given on this page shows at once; a reload reads it back from the view.
  const [answered, setAnswered] = useState<EstimatePageState | null>(null);
  const [dead, setDead] = useState<DeadLink | null>(null);
  useDocumentTitle(`Estimate from ${view.company.name}`);
  if (dead) return <DeadLinkCard dead={dead} />;
  const state = answered ?? pageStateOf(view);
  // Once accepted, the option taken is the one that counts; the others would only confuse.
  const chosen =
    state.kind === 'accepted'
      ? view.tiers.find((tier) => tier.id === view.chosenTierId)
      : undefined;
  const tiers = chosen ? [chosen] : view.tiers;
  const severalTiers = tiers.length > 1;
  return (
    <div className="min-h-dvh bg-sand-100 px-3 py-6 sm:px-6 sm:py-10">
      <main className="mx-auto flex w-full max-w-3xl flex-col gap-8 rounded-xl border border-line bg-white p-4 shadow-sm sm:p-8">
        <EstimateHeader view={view} />
        {state.kind !== 'open' ? (
          <AnswerPanel state={state} view={view} takeFocus={answered !== null} />
        ) : (
          <p>
            <a href="#accept-heading" className={buttonClasses('secondary', 'w-full sm:w-auto')}>
              Go to accept or decline
            </a>
          </p>
        )}
        <AreaPlans areas={view.areas} units={view.units} />
        <section aria-labelledby="price-heading" className="flex flex-col gap-4">
          <h2 id="price-heading" className="text-2xl font-bold">
            {chosen
              ? `What you accepted: ${chosen.name}`
              : severalTiers
                ? 'Your options'
                : 'The price'}
          </h2>
          {severalTiers ? (
            <p>There are {tiers.length} options. Choose one when you accept.</p>
          ) : null}
          {tiers.map((tier) => (
            <TierPrice key={tier.id} tier={tier} currency={view.currency} />
          ))}
        </section>
        <NotesAndCautions view={view} />
        {view.cancellation.applies ? (
          <CancellationNotice notice={view.cancellation.notice} />
        ) : null}
        {state.kind === 'open' ? (
          <>
            <AcceptForm
              token={token}
              view={view}
              onAccepted={(answer) =>
                setAnswered({
                  kind: 'accepted',
                  at: answer.acceptedAt,
                  cancellationEndsAt: answer.cancellationEndsAt,
                })
              }
              onDeadLink={setDead}
            />
            <DeclineForm
              token={token}
              companyName={view.company.name}
              onDeclined={(at) => setAnswered({ kind: 'declined', at })}
              onDeadLink={setDead}
            />
          </>
        ) : null}
      </main>
    </div>
  );
}
