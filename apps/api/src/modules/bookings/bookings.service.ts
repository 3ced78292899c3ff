// Bookings of crews on jobs. Every create and change is checked by the booking rules inside a
// transaction that holds the crew's row lock (then the job's), so two requests filling the
// same crew-day cannot both pass. Booking an accepted job moves it to scheduled; deleting its
// last booking leaves it scheduled (the lifecycle has no way back to accepted).
import { bookingPhaseLabels, canTransition, checkBookingRange } from '@seamwright/domain';
import type { BookingIssue, BookingPhase } from '@seamwright/domain';
import { crewColourHex } from '@seamwright/shared';
import type {
  BookingListQuery,
  BookingSaved,
  BookingView,
  CreateBookingData,
  UpdateBookingData,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { crewIdsOfUser, findCrew } from '../crews/crews.repository.js';
import { assertCancellationPeriodOver } from '../jobs/job-cancellation-guard.js';
import { applyJobStatusEffects } from '../jobs/job-status-effects.js';
import { lockJob, updateJob } from '../jobs/jobs.repository.js';
import { checkCandidate, refusal } from './booking-checks.js';
import type { BookingCalendarRow } from './bookings.repository.js';
import {
  createBooking,
  deleteBooking,
  findBooking,
  listCalendarBookings,
  updateBooking,
} from './bookings.repository.js';
import { warningsOnRead } from './booking-read-warnings.js';

const missing = (what: string, path: string) =>
  new AppError('NOT_FOUND', `${what} not found`, {
    errors: [{ path, message: `No such ${what.toLowerCase()} in this company` }],
  });

/** A range that runs backwards or is too long is bad input (400), not a refusal. */
function assertRange(range: { startDate: string; endDate: string }): void {
  const issue = checkBookingRange(range);
  if (issue)
    throw new AppError('VALIDATION_FAILED', `${issue.path}: ${issue.message}`, {
      errors: [{ path: issue.path, message: issue.message }],
    });
}

const conflict = (path: string, message: string) =>
  new AppError('CONFLICT', message, { errors: [{ path, message }] });

export function toBookingView(row: BookingCalendarRow, warnings: BookingIssue[]): BookingView {
  return {
    id: row.id,
    crewId: row.crewId,
    jobId: row.jobId,
    startDate: row.startDate,
    endDate: row.endDate,
    phase: row.phase as BookingPhase,
    phaseLabel: bookingPhaseLabels[row.phase as BookingPhase],
    notes: row.notes,
    version: row.version,
    crew: {
      id: row.crew.id,
      name: row.crew.name,
      colour: row.crew.colour,
      colourHex: crewColourHex(row.crew.colour),
    },
    job: { id: row.job.id, title: row.job.title, status: row.job.status },
    customerName: row.job.customer.name,
    siteAddress: `${row.job.site.addressLine1}, ${row.job.site.city}`,
    warnings: warnings.map(({ code, path, message }) => ({ code, path, message })),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function companyZone(ctx: RequestContext): Promise<string> {
  // Read without the transaction: findOwnCompany would lock the company row inside one.
  return (await findOwnCompany(ctx))?.timeZone ?? 'UTC';
}

/** Locks the crews (in id order, so two changes never wait on each other in a circle). */
async function lockCrews(ctx: RequestContext, ids: string[], tx: Tx) {
  const crews = [];
  for (const id of [...new Set(ids)].sort()) {
    const crew = await findCrew(ctx, id, tx, true);
    if (!crew) throw missing('Crew', 'crewId');
    crews.push(crew);
  }
  return crews;
}

/** An accepted job becomes scheduled with its first booking, unless the buyer may still cancel. */
async function scheduleJob(
  ctx: RequestContext,
  job: { id: string; status: BookingView['job']['status'] },
  cancellationEndsAt: Date | null,
  tx: Tx,
): Promise<BookingIssue | null> {
  if (job.status !== 'accepted' || !canTransition('accepted', 'scheduled')) return null;
  if (cancellationEndsAt)
    return {
      code: 'cancellation-period',
      path: 'jobId',
      message:
        'The job stays accepted until the buyer’s right to cancel ends; change the booking after that to mark it scheduled',
    };
  await assertCancellationPeriodOver(ctx, job.id, 'scheduled', tx);
  await updateJob(ctx, job.id, { status: 'scheduled' }, tx);
  await applyJobStatusEffects(ctx, job.id, 'scheduled', tx);
  await recordAuditEvent(
    ctx,
    {
      action: 'job.status_changed',
      entity: 'job',
      entityId: job.id,
      data: { from: 'accepted', to: 'scheduled', by: 'booking' },
    },
    tx,
  );
  return null;
}

export function createBookingsService(deps: Pick<ServiceDeps, 'sequelize'>) {
  const { sequelize } = deps;

  async function list(ctx: RequestContext, query: BookingListQuery): Promise<BookingView[]> {
    // A crew lead sees only the crews they are on.
    let crewIds = query.crewId ? [query.crewId] : undefined;
    if (ctx.role === 'crew_lead') {
      const own = await crewIdsOfUser(ctx, ctx.userId);
      crewIds = crewIds ? crewIds.filter((id) => own.includes(id)) : own;
    }
    const [rows, timeZone] = await Promise.all([
      listCalendarBookings(ctx, {
        from: query.from,
        to: query.to,
        ...(crewIds ? { crewIds } : {}),
      }),
      companyZone(ctx),
    ]);
    const warnings = await warningsOnRead(ctx, rows, timeZone);
    return rows.map((row) => toBookingView(row, warnings.get(row.id) ?? []));
  }

  async function create(ctx: RequestContext, input: CreateBookingData): Promise<BookingSaved> {
    assertRange(input);
    const timeZone = await companyZone(ctx);
    return inTransaction(sequelize, async (tx) => {
      const [crew] = await lockCrews(ctx, [input.crewId], tx);
      if (!crew) throw missing('Crew', 'crewId');
      if (crew.archivedAt)
        throw conflict('crewId', `${crew.name} is archived: restore it to book it`);
      const job = await lockJob(ctx, input.jobId, tx);
      if (!job) throw missing('Job', 'jobId');
      const evaluation = await checkCandidate(
        ctx,
        { bookingId: null, crew, job, ...input },
        timeZone,
        tx,
      );
      if (evaluation.refusals.length > 0) throw refusal(evaluation);
      const booking = await createBooking(
        ctx,
        {
          crewId: crew.id,
          jobId: job.id,
          startDate: input.startDate,
          endDate: input.endDate,
          phase: input.phase,
          notes: input.notes,
          createdBy: ctx.userId,
        },
        tx,
      );
      const stays = await scheduleJob(ctx, job, evaluation.cancellationEndsAt, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.booking_added',
          entity: 'job',
          entityId: job.id,
          data: {
            bookingId: booking.id,
            crew: crew.name,
            startDate: input.startDate,
            endDate: input.endDate,
            phase: input.phase,
          },
        },
        tx,
      );
      const warnings = stays ? [...evaluation.warnings, stays] : evaluation.warnings;
      return { id: booking.id, version: booking.version, warnings };
    });
  }

  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdateBookingData,
  ): Promise<BookingSaved> {
    const current = await findBooking(ctx, id);
    if (!current) throw notFound('Booking');
    const timeZone = await companyZone(ctx);
    return inTransaction(sequelize, async (tx) => {
      const crewId = input.crewId ?? current.crewId;
      const crews = await lockCrews(ctx, [current.crewId, crewId], tx);
      const locked = await findBooking(ctx, id, tx);
      if (!locked) throw notFound('Booking');
      // Moved to another crew since it was read: lock again from the start.
      if (locked.crewId !== current.crewId)
        throw conflict(
          'version',
          'The booking changed while you were editing it: reload and try again',
        );
      if (input.version !== undefined && input.version !== locked.version)
        throw conflict(
          'version',
          `The booking changed since you opened it (now version ${locked.version}): reload and try again`,
        );
      const crew = crews.find((c) => c.id === crewId);
      if (!crew) throw missing('Crew', 'crewId');
      if (crew.archivedAt && crew.id !== locked.crewId)
        throw conflict('crewId', `${crew.name} is archived: restore it to book it`);
      const job = await lockJob(ctx, locked.jobId, tx);
      if (!job) throw notFound('Booking');
      const next = {
        crewId,
        startDate: input.startDate ?? locked.startDate,
        endDate: input.endDate ?? locked.endDate,
        phase: (input.phase ?? locked.phase) as BookingPhase,
        notes: input.notes === undefined ? locked.notes : input.notes,
      };
      assertRange(next);
      const evaluation = await checkCandidate(
        ctx,
        { bookingId: id, crew, job, ...next },
        timeZone,
        tx,
      );
      if (evaluation.refusals.length > 0) throw refusal(evaluation);
      const version = locked.version + 1;
      await updateBooking(ctx, id, { ...next, version }, tx);
      const stays = await scheduleJob(ctx, job, evaluation.cancellationEndsAt, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.booking_changed',
          entity: 'job',
          entityId: job.id,
          data: {
            bookingId: id,
            from: {
              crewId: locked.crewId,
              startDate: locked.startDate,
              endDate: locked.endDate,
              phase: locked.phase,
            },
            to: { crewId, startDate: next.startDate, endDate: next.endDate, phase: next.phase },
          },
        },
        tx,
      );
      return {
        id,
        version,
        warnings: stays ? [...evaluation.warnings, stays] : evaluation.warnings,
      };
    });
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    const current = await findBooking(ctx, id);
    if (!current) throw notFound('Booking');
    await inTransaction(sequelize, async (tx) => {
      await lockCrews(ctx, [current.crewId], tx);
      const locked = await findBooking(ctx, id, tx);
      if (!locked) throw notFound('Booking');
      await deleteBooking(ctx, id, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.booking_removed',
          entity: 'job',
          entityId: locked.jobId,
          data: {
            bookingId: id,
            startDate: locked.startDate,
            endDate: locked.endDate,
            phase: locked.phase,
          },
        },
        tx,
      );
    });
  }

  return { list, create, update, remove };
}
