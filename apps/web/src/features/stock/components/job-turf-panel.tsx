import { useState } from 'react';
import type { JobStatus } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Loading } from '../../../components/ui/loading';
import { ErrorPanel } from '../../../components/ui/region-error';
import { ApiError } from '../../../lib/api-error';
import { useUnits } from '../../../lib/units';
import { useLotRolls } from '../api/get-lot-rolls';
import { useReservation } from '../api/get-reservation';
import { useReleaseTurf } from '../api/release-turf';
import { useReserveTurf } from '../api/reserve-turf';
import { feetInWords } from '../utils/feet-words';
import { reservationLots, usedRolls } from '../utils/reservation-rolls';
import { ReservationPieces } from './reservation-pieces';
import { ReturnRemnantsForm } from './return-remnants-form';

/** The API reserves turf once the sale is made, until the crew cuts it. */
const reservable: readonly JobStatus[] = ['accepted', 'scheduled'];
/** Remnants come back while the crew is on the job or just after. */
const returnable: readonly JobStatus[] = ['in_progress', 'installed'];

/** A 409 that holding what there is would get past: stock is short (the API names `stock`). */
function isShort(error: unknown): error is ApiError {
  return (
    error instanceof ApiError &&
    error.status === 409 &&
    error.fieldErrors.some((e) => e.path === 'stock')
  );
}

function nothingHeld(jobStatus: JobStatus): string {
  if (reservable.includes(jobStatus))
    return 'No turf is held for this job yet. Reserving takes every piece of its saved plans from rolls of one dye lot.';
  if (jobStatus === 'lead' || jobStatus === 'estimated')
    return 'Turf is reserved once the job is accepted; nothing is held yet.';
  return 'No turf is held for this job.';
}

interface JobTurfPanelProps {
  jobId: string;
  jobStatus: JobStatus;
  canWrite: boolean;
}

/** The job's turf from stock: the lot and pieces held (or cut), reserving, releasing, remnants. */
export function JobTurfPanel({ jobId, jobStatus, canWrite }: JobTurfPanelProps) {
  const units = useUnits();
  const query = useReservation(jobId);
  const reserve = useReserveTurf(jobId);
  const release = useReleaseTurf(jobId);
  const [confirming, setConfirming] = useState(false);
  const reservation = query.data;
  const lots = useLotRolls(reservation ? reservationLots(reservation) : []);

  const heading = (
    <h2 id="job-turf" className="text-xl font-bold">
      Turf from stock
    </h2>
  );
  if (query.isPending)
    return (
      <section aria-labelledby="job-turf" className="flex flex-col gap-3">
        {heading}
        <Loading label="Loading the turf reservation…" />
      </section>
    );
  if (query.isError)
    return (
      <section aria-labelledby="job-turf" className="flex flex-col gap-3">
        {heading}
        <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />
      </section>
    );

  const { status } = query.data;
  const rolls = usedRolls(query.data);
  const canReserve = canWrite && reservable.includes(jobStatus) && status !== 'cut';
  const short = isShort(reserve.error) ? reserve.error : null;
  const otherError = reserve.error && !short ? reserve.error : release.error;
  return (
    <section aria-labelledby="job-turf" className="flex flex-col gap-4">
      {heading}
      {status === null ? (
        <p className="text-ink-muted">{nothingHeld(jobStatus)}</p>
      ) : (
        <ReservationPieces reservation={query.data} rolls={rolls} stock={lots} />
      )}

      {short ? (
        <div role="alert" className="rounded-md border-2 border-caution-500 bg-caution-50 p-3">
          <p className="font-semibold">{feetInWords(short.detail, units)}</p>
          <p className="mt-1 text-ink-muted">
            Nothing is held yet. Hold what is in stock now and order the rest, or order first and
            reserve again when it arrives.
          </p>
          <Button
            className="mt-3"
            isBusy={reserve.isPending}
            onClick={() => reserve.mutate({ allowShort: true })}
          >
            Hold what is in stock
          </Button>
        </div>
      ) : null}
      {otherError ? (
        <p role="alert" className="font-semibold text-brick-700">
          {otherError instanceof ApiError
            ? feetInWords(otherError.detail, units)
            : 'Something went wrong. Please try again.'}
        </p>
      ) : null}

      {canReserve ? (
        <div className="flex flex-wrap gap-2">
          <Button
            isBusy={reserve.isPending}
            onClick={() => {
              release.reset();
              reserve.mutate({});
            }}
          >
            {status === 'held' ? 'Reserve again' : 'Reserve turf'}
          </Button>
          {status === 'held' ? (
            <Button variant="secondary" onClick={() => setConfirming(true)}>
              Release
            </Button>
          ) : null}
        </div>
      ) : null}

      {canWrite && status === 'cut' && returnable.includes(jobStatus) && rolls.length > 0 ? (
        <div className="rounded-lg border border-line bg-white p-4">
          <h3 className="mb-3 text-lg font-semibold">Return remnants</h3>
          <ReturnRemnantsForm jobId={jobId} rolls={rolls} />
        </div>
      ) : null}

      <ConfirmDialog
        isOpen={confirming}
        title="Release this job’s turf?"
        confirmLabel="Release"
        isBusy={release.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          release.mutate(undefined, {
            onSettled: () => setConfirming(false),
            onSuccess: () => reserve.reset(),
          })
        }
      >
        The rolls go back to free stock and another job may take them. Reserve again before the crew
        cuts.
      </ConfirmDialog>
    </section>
  );
}
