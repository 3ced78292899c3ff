// Gathers the facts for the booking rules (@seamwright/domain) inside a booking's transaction,
// and turns refusals into the 409 of the API contract: `{ code, errors: [{ path, message }] }`.
import { evaluateBooking } from '@seamwright/domain';
import type { BookingEvaluation, BookingPhase, JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { latestRunningCancellation } from '../estimates/estimate-links.repository.js';
import { listEstimatesOfJob } from '../estimates/estimates.repository.js';
import type { CrewRow } from '../crews/crews.repository.js';
import { listCrewBookingsBetween } from './bookings.repository.js';
import { readJobReadiness } from './job-readiness.repository.js';

export interface Candidate {
  bookingId: string | null;
  crew: CrewRow;
  job: { id: string; status: JobStatus };
  startDate: string;
  endDate: string;
  phase: BookingPhase;
}

/** When the buyer's right to cancel ends, while it still runs (TRADE.md §8.2); else null. */
export async function runningCancellationEnd(
  ctx: RequestContext,
  jobId: string,
  tx: Tx,
): Promise<Date | null> {
  const versions = await listEstimatesOfJob(ctx, jobId, tx);
  return latestRunningCancellation(
    ctx,
    versions.map((v) => v.id),
    new Date(),
    tx,
  );
}

export async function checkCandidate(
  ctx: RequestContext,
  candidate: Candidate,
  timeZone: string,
  tx: Tx,
): Promise<BookingEvaluation & { cancellationEndsAt: Date | null }> {
  const [others, readiness, cancellationEndsAt] = await Promise.all([
    listCrewBookingsBetween(ctx, candidate.crew.id, candidate, candidate.bookingId, tx),
    readJobReadiness(ctx, [candidate.job.id], tx),
    runningCancellationEnd(ctx, candidate.job.id, tx),
  ]);
  const job = readiness.get(candidate.job.id) ?? { tickets: [], turf: null };
  const evaluation = evaluateBooking({
    startDate: candidate.startDate,
    endDate: candidate.endDate,
    phase: candidate.phase,
    jobId: candidate.job.id,
    jobStatus: candidate.job.status,
    crew: candidate.crew,
    otherBookings: others,
    tickets: job.tickets,
    cancellationEndsAt,
    turf: job.turf,
    timeZone,
    now: new Date(),
  });
  return { ...evaluation, cancellationEndsAt };
}

/** The refusal answer: the first reason as the detail, every reason by field. */
export function refusal(evaluation: BookingEvaluation): AppError {
  const errors = evaluation.refusals.map(({ path, message }) => ({ path, message }));
  const detail = evaluation.refusals.map((r) => r.message).join('; ');
  return new AppError('CONFLICT', `The booking was refused: ${detail}`, { errors });
}
