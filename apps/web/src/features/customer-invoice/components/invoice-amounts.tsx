import type { PublicInvoiceView } from '@seamwright/shared';
import { formatCents } from '../../../lib/money';
import { PricedLines } from '../../../components/ui/priced-lines';

/** The lines as a list (a table does not fit a phone), then the totals and what is left. */
export function InvoiceAmounts({ view }: { view: PublicInvoiceView }) {
  const money = (cents: number) => formatCents(cents, view.currency);
  return (
    <section aria-labelledby="amounts-heading" className="rounded-lg border border-line p-4 sm:p-6">
      <h2 id="amounts-heading" className="text-xl font-bold">
        What this invoice is for
      </h2>
      <PricedLines lines={view.lines} currency={view.currency} />
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
