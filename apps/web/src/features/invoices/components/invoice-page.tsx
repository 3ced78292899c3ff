import type { InvoiceView } from '@seamwright/shared';
import { formatCents } from '../../../lib/money';

const methodLabels = {
  cheque: 'Cheque',
  bank_transfer: 'Bank transfer',
  cash: 'Cash',
  card: 'Card',
} as const;

function Row({
  label,
  cents,
  currency,
  strong = false,
}: {
  label: string;
  cents: number;
  currency: string;
  strong?: boolean;
}) {
  return (
    <div
      className={`flex justify-between gap-4 py-1 ${strong ? 'border-t border-ink font-bold' : ''}`}
    >
      <dt>{label}</dt>
      <dd className="tabular-nums">{formatCents(cents, currency)}</dd>
    </div>
  );
}

/** One invoice as the office reads it: lines, totals, payments, credit notes and balance. */
export function InvoicePage({ invoice }: { invoice: InvoiceView }) {
  const { currency } = invoice;
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="invoice-lines">
        <h2 id="invoice-lines" className="mb-2 text-lg font-bold">
          Lines
        </h2>
        <ul className="divide-y divide-sand-200 rounded border border-sand-200 bg-white">
          {invoice.lines.map((line, index) => (
            <li key={index} className="flex flex-wrap justify-between gap-2 p-3">
              <span>
                {line.label}
                <span className="block text-sm text-ink-muted">
                  {line.quantity} {line.unit} × {formatCents(line.unitPriceCents, currency)}
                  {line.taxable ? ' · taxable' : ''}
                </span>
              </span>
              <span className="tabular-nums">{formatCents(line.amountCents, currency)}</span>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="invoice-totals" className="max-w-md self-end w-full">
        <h2 id="invoice-totals" className="sr-only">
          Totals
        </h2>
        <dl>
          <Row label="Subtotal" cents={invoice.subtotalCents} currency={currency} />
          <Row label="Tax" cents={invoice.taxCents} currency={currency} />
          <Row label="Total" cents={invoice.totalCents} currency={currency} strong />
          {invoice.payments.map((p) => (
            <Row
              key={p.id}
              label={`Paid ${p.receivedOn} (${methodLabels[p.method]})`}
              cents={-(p.amountCents - p.refundedCents)}
              currency={currency}
            />
          ))}
          {invoice.creditNotes.map((c) => (
            <Row
              key={c.id}
              label={`Credit ${c.reference}: ${c.reason}`}
              cents={-c.amountCents}
              currency={currency}
            />
          ))}
          <Row label="Balance due" cents={invoice.balanceCents} currency={currency} strong />
        </dl>
        <p className="mt-2 text-ink-muted">
          Issued {invoice.issuedOn} · due {invoice.dueDate}
        </p>
      </section>
      {invoice.voidReason ? (
        <p role="note" className="rounded border border-ink p-3">
          Void: {invoice.voidReason}
        </p>
      ) : null}
    </div>
  );
}
