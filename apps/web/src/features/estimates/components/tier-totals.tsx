import type { EstimateTier } from '@seamwright/shared';

type EstimateTotals = Pick<
  EstimateTier,
  'subtotalCents' | 'taxCents' | 'totalCents' | 'depositCents'
>;
import { formatCents } from '../../../lib/money';

/** The server's totals of one tier; the deposit is part of the total, not added to it. */
export function TierTotals({
  totals,
  currency,
  taxRateBasisPoints,
}: {
  totals: EstimateTotals;
  currency: string;
  taxRateBasisPoints: number;
}) {
  const row = (label: string, cents: number, strong = false) => (
    <div className={`flex justify-between gap-6 py-1 ${strong ? 'text-lg font-bold' : ''}`}>
      <dt>{label}</dt>
      <dd className="tabular-nums">{formatCents(cents, currency)}</dd>
    </div>
  );
  return (
    <dl className="ml-auto w-full max-w-sm rounded-lg border border-line bg-white px-4 py-2">
      {row('Subtotal', totals.subtotalCents)}
      {row(`Tax (${(taxRateBasisPoints / 100).toFixed(2)} %)`, totals.taxCents)}
      {row('Total', totals.totalCents, true)}
      {row('Deposit due at acceptance', totals.depositCents)}
    </dl>
  );
}
