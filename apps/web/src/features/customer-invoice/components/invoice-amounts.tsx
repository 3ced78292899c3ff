import type { PublicInvoiceView } from '@seamwright/shared';
import { formatCents } from '../../../lib/money';
import { formatQuantity } from '../../../lib/plain-words';

/** The lines as a list (a table does not fit a phone), then the totals and what is left. */
export function InvoiceAmounts({ view }: { view: PublicInvoiceView }) {
  const money = (cents: number) => formatCents(cents, view.currency);
  return (
    <section aria-labelledby="amounts-heading" className="rounded-lg border border-line p-4 sm:p-6">
      <h2 id="amounts-heading" className="text-xl font-bold">
        What this invoice is for
      </h2>
      <ul className="mt-3 divide-y divide-line">
        {view.lines.map((line, index) => (
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
        <dd className="text-right">{money(view.subtotalCents)}</dd>
        <dt>Tax</dt>
        <dd className="text-right">{money(view.taxCents)}</dd>
        <dt className="font-bold">Total</dt>
        <dd className="text-right font-bold">{money(view.totalCents)}</dd>
        {view.paidCents > 0 ? (
          <>
            <dt>Paid so far</dt>
            <dd className="text-right">−{money(view.paidCents)}</dd>
          </>
        ) : null}
        {view.creditedCents > 0 ? (
          <>
            <dt>Credited</dt>
            <dd className="text-right">−{money(view.creditedCents)}</dd>
          </>
        ) : null}
        <dt className="text-lg font-bold">Left to pay</dt>
        <dd className="text-right text-lg font-bold" data-testid="balance">
          {money(Math.max(0, view.balanceCents))}
        </dd>
      </dl>
      <p className="mt-4 text-sm text-ink-muted">{view.roundingRule}</p>
    </section>
  );
}
