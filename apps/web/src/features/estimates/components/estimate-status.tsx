import type { EstimateStatus } from '@seamwright/shared';
import { cn } from '../../../components/ui/cn';
import { estimateStatusLabels } from '../utils/estimate-words';

const tones: Record<EstimateStatus, string> = {
  draft: 'bg-sand-200 text-ink',
  sent: 'bg-moss-100 text-moss-800',
  accepted: 'bg-moss-700 text-white',
  declined: 'bg-brick-50 text-brick-700',
  superseded: 'bg-sand-100 text-ink-muted',
};

/** An estimate version's status as a small tag (the words carry the meaning, not the colour). */
export function EstimateStatusBadge({ status }: { status: EstimateStatus }) {
  return (
    <span
      className={cn(
        'inline-block rounded px-2 py-0.5 text-sm font-semibold whitespace-nowrap',
        tones[status],
      )}
    >
      {estimateStatusLabels[status]}
    </span>
  );
}
