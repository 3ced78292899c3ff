import type { PublicEstimateTier } from '@seamwright/shared';
import { formatMoney, formatQuantity } from '../../../lib/plain-words';

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
      <ul className="mt-3 divide-y divide-line" aria-label={`What ${tier.name} includes`}>
        {tier.lines.map((line, index) => (
          <li key={index} className="flex flex-wrap items-baseline justify-between gap-x-4 py-3">
            <span className="min-w-0 flex-1 font-medium">{line.label}</span>
            <span className="font-semibold tabular-nums">{money(line.amountCents)}</span>
            <span className="basis-full text-sm text-ink-muted">
              {formatQuantity(line.quantity, line.unit)} at {money(line.unitPriceCents)}
            </span>
          </li>
        ))}
      </ul>
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
