import type { InvoiceStatus } from '@seamwright/shared';
import { cn } from '../../../components/ui/cn';

export const invoiceStatusLabels: Record<InvoiceStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  partly_paid: 'Partly paid',
  paid: 'Paid',
  overdue: 'Overdue',
  void: 'Void',
};

const tones: Partial<Record<InvoiceStatus, string>> = {
  draft: 'bg-sand-200 text-ink',
  void: 'bg-sand-200 text-ink line-through',
  overdue: 'bg-ink text-white',
};

/** The invoice's status as a small tag (the word carries the meaning, not the colour). */
export function InvoiceStatusBadge({ status }: { status: InvoiceStatus }) {
  return (
    <span
      className={cn(
        'inline-block rounded px-2 py-0.5 text-sm font-semibold whitespace-nowrap',
        tones[status] ?? 'bg-moss-100 text-moss-800',
      )}
    >
      {invoiceStatusLabels[status]}
    </span>
  );
}
