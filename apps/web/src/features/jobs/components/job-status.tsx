import { jobStatusLabels, type JobStatus } from '@seamwright/shared';
import { cn } from '../../../components/ui/cn';

/** `In progress`: the status as a label starts a sentence. */
export function statusLabel(status: JobStatus): string {
  const words = jobStatusLabels[status];
  return words.charAt(0).toUpperCase() + words.slice(1);
}

const tones: Partial<Record<JobStatus, string>> = {
  lost: 'bg-sand-200 text-ink',
  cancelled: 'bg-sand-200 text-ink',
  closed: 'bg-sand-200 text-ink',
};

/** The job's status as a small tag (words, not colour alone, carry the meaning). */
export function JobStatusBadge({ status }: { status: JobStatus }) {
  return (
    <span
      className={cn(
        'inline-block rounded px-2 py-0.5 text-sm font-semibold whitespace-nowrap',
        tones[status] ?? 'bg-moss-100 text-moss-800',
      )}
    >
      {statusLabel(status)}
    </span>
  );
}
