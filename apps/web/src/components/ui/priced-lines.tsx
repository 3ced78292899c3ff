import { formatCents } from '../../lib/money';
import { formatQuantity } from '../../lib/plain-words';

export interface PricedLine {
  label: string;
  quantity: number;
  unit: string;
  unitPriceCents: number;
  amountCents: number;
}

/**
 * Priced lines as a list, not a table (a table does not fit a phone): the label and amount,
 * then the quantity at its unit price in small print.
 */
export function PricedLines({
  lines,
  currency,
  label,
}: {
  lines: readonly PricedLine[];
  currency: string;
  /** The list's accessible name, when the heading above does not give it. */
  label?: string;
}) {
  const money = (cents: number) => formatCents(cents, currency);
  return (
    <ul className="mt-3 divide-y divide-line" aria-label={label}>
      {lines.map((line, index) => (
        <li key={index} className="flex flex-wrap items-baseline justify-between gap-x-4 py-3">
          <span className="min-w-0 flex-1 font-medium">{line.label}</span>
          <span className="font-semibold tabular-nums">{money(line.amountCents)}</span>
          <span className="basis-full text-sm text-ink-muted">
            {formatQuantity(line.quantity, line.unit)} at {money(line.unitPriceCents)}
          </span>
        </li>
      ))}
    </ul>
  );
}
