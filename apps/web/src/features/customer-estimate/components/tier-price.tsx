import type { PublicEstimateTier } from '@seamwright/shared';
import { PricedLines } from '../../../components/ui/priced-lines';
import { formatMoney } from '../../../lib/plain-words';

/** One option: its lines as a list (a table does not fit a phone), then its totals. */
export function TierPrice({ tier, currency }: { tier: PublicEstimateTier; currency: string }) {
  const money = (cents: number) => formatMoney(cents, currency);
  return (
    <section
      aria-labelledby={`tier-${tier.id}`}
      className="rounded-lg border border-line bg-white p-4 sm:p-6"
    >
      <h3 id={`tier-${tier.id}`} className="text-xl font-bold">
        {tier.name}
      </h3>
      <PricedLines lines={tier.lines} currency={currency} label={`What ${tier.name} includes`} />
      <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 border-t-2 border-ink pt-3 tabular-nums">
        <dt>Subtotal</dt>
        <dd className="text-right">{money(tier.subtotalCents)}</dd>
        <dt>Tax</dt>
        <dd className="text-right">{money(tier.taxCents)}</dd>
        <dt className="text-lg font-bold">Total</dt>
        <dd className="text-right text-lg font-bold" data-testid="tier-total">
          {money(tier.totalCents)}
        </dd>
        {tier.depositCents > 0 ? (
          <>
            <dt>Deposit to book the work</dt>
            <dd className="text-right">{money(tier.depositCents)}</dd>
          </>
        ) : null}
      </dl>
    </section>
  );
}
