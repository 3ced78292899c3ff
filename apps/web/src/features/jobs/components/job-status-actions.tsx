import { useState } from 'react';
import type { JobStatus } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { statusLabel } from './job-status';

/** Ending a job this way cannot be undone, so the button asks once. */
const endings: readonly JobStatus[] = ['lost', 'cancelled'];

const buttonLabels: Record<JobStatus, string> = {
  lead: 'Back to lead',
  estimated: 'Mark estimated',
  accepted: 'Mark accepted',
  scheduled: 'Mark scheduled',
  in_progress: 'Start work',
  installed: 'Mark installed',
  invoiced: 'Mark invoiced',
  paid: 'Mark paid',
  closed: 'Close the job',
  lost: 'Mark lost',
  cancelled: 'Cancel the job',
};

interface JobStatusActionsProps {
  status: JobStatus;
  /** From the server: the only moves it will accept. */
  allowed: readonly JobStatus[];
  isBusy?: boolean;
  onMove: (status: JobStatus) => Promise<unknown> | void;
}

/**
 * One button per move the lifecycle allows from here, and nothing else; lost and cancelled ask
 * for confirmation first. The server still checks every move (409 with the reason).
 */
export function JobStatusActions({ status, allowed, isBusy, onMove }: JobStatusActionsProps) {
  const [asking, setAsking] = useState<JobStatus | null>(null);
  if (allowed.length === 0)
    return <p className="text-ink-muted">{statusLabel(status)} is final: no further moves.</p>;
  const forward = allowed.filter((s) => !endings.includes(s));
  const ends = allowed.filter((s) => endings.includes(s));
  return (
    <div className="flex flex-wrap gap-2" role="group" aria-label="Move the job to">
      {forward.map((next) => (
        <Button key={next} onClick={() => void onMove(next)} isBusy={isBusy}>
          {buttonLabels[next]}
        </Button>
      ))}
      {ends.map((next) => (
        <Button key={next} variant="secondary" onClick={() => setAsking(next)} disabled={isBusy}>
          {buttonLabels[next]}
        </Button>
      ))}
      <ConfirmDialog
        isOpen={asking !== null}
        title={asking === 'lost' ? 'Mark this job lost?' : 'Cancel this job?'}
        confirmLabel={asking ? buttonLabels[asking] : ''}
        isBusy={isBusy}
        onCancel={() => setAsking(null)}
        onConfirm={() => {
          const next = asking;
          setAsking(null);
          if (next) void onMove(next);
        }}
      >
        The job leaves the open work for good; it cannot move on from{' '}
        {asking ? statusLabel(asking).toLowerCase() : ''}.
      </ConfirmDialog>
    </div>
  );
}
