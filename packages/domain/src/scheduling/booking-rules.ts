// The rules a booking of a crew on a job is checked against, on every create and change. Each
// rule gives a refusal (the change is not saved) or a warning (saved, and shown on the
// calendar). Decisions, also in DEVELOPERS.md:
// - more jobs on a crew's day than its capacity: refusal (two phases of one job count once);
// - a day outside the crew's working days: warning;
// - digging (tear-out and base) with no ticket, a ticket in conflict, before the earliest
//   lawful start or after the ticket expires: refusal (checkDigDate); digging on the earliest
//   day itself, before the hour it opens: warning; a ticket not yet clear, or one that expires
//   before the booking ends: warning;
// - any day inside the buyer's cancellation period: refusal;
// - laying turf (turf, seams and infill) with the job's turf not reserved or short: warning;
// - a job that is not accepted yet, or is past installing: refusal.
import type { JobStatus } from '../job-lifecycle.js';
import { jobStatusLabels } from '../job-lifecycle.js';
import type { CalendarDate } from '../calendar/calendar.js';
import { addCalendarDays, localDateOf, startOfLocalDay, weekdayOf } from '../calendar/calendar.js';
import { checkDigDate } from '../locate/check-dig-date.js';
import type { LocateDays } from '../locate/rules.js';
import type { LocateTicketStatus } from '../locate/status.js';
import { effectiveLocateStatus } from '../locate/status.js';
import type { DayRange } from './booking-days.js';
import { dayCount, daysOf, rangesOverlap } from './booking-days.js';
import type { BookingPhase } from './phases.js';
import { diggingPhase, maxBookingDays, turfPhase, weekdayShortNames } from './phases.js';

export type BookingIssueCode =
  | 'invalid-range'
  | 'job-not-bookable'
  | 'over-capacity'
  | 'not-a-working-day'
  | 'no-locate-ticket'
  | 'locate-conflict'
  | 'before-earliest-dig'
  | 'ticket-expired'
  | 'notice-too-early'
  | 'dig-opens-later-that-day'
  | 'locate-not-clear'
  | 'ticket-expires-during-booking'
  | 'cancellation-period'
  | 'turf-not-reserved'
  | 'turf-short';

export interface BookingIssue {
  code: BookingIssueCode;
  /** The request field it is about, for the problem+json `errors[].path`. */
  path: 'startDate' | 'endDate' | 'jobId' | 'crewId' | 'phase';
  message: string;
}

export interface BookingTicket {
  status: LocateTicketStatus;
  /** ISO instants, as LocateTicketTimes has them. */
  earliestDigAt: string;
  expiresAt: string;
  latestStartAt: string | null;
  timeZone: string;
  maxAhead?: LocateDays | null;
}

export interface BookingFacts extends DayRange {
  phase: BookingPhase;
  jobId: string;
  jobStatus: JobStatus;
  crew: { name: string; workingDays: readonly number[]; jobsPerDay: number };
  /** The crew's other bookings (this one left out) that may share days with it. */
  otherBookings: readonly (DayRange & { jobId: string })[];
  /** The job's locate tickets, newest call first. */
  tickets: readonly BookingTicket[];
  /** When the buyer's running cancellation period ends, or null when none runs. */
  cancellationEndsAt: Date | null;
  /** The job's turf: null when the job has no turf to lay (no saved plan). */
  turf: { reserved: boolean; shortFt: number } | null;
  timeZone: string;
  now: Date;
}

export interface BookingEvaluation {
  refusals: BookingIssue[];
  warnings: BookingIssue[];
}

/** Jobs a crew may be booked on: accepted (and so on) up to the install itself. */
export const bookableJobStatuses: readonly JobStatus[] = ['accepted', 'scheduled', 'in_progress'];

const dayWords = (day: CalendarDate) => `${weekdayShortNames[weekdayOf(day)] ?? ''} ${day}`;

function listDays(days: readonly CalendarDate[]): string {
  const shown = days.slice(0, 3).map(dayWords).join(', ');
  return days.length > 3 ? `${shown} and ${days.length - 3} more` : shown;
}

/** Only the range itself: the dates are real and in order, and not too long. */
export function checkBookingRange(range: DayRange): BookingIssue | null {
  if (range.endDate < range.startDate)
    return {
      code: 'invalid-range',
      path: 'endDate',
      message: 'The last day cannot be before the first day',
    };
  if (dayCount(range) > maxBookingDays)
    return {
      code: 'invalid-range',
      path: 'endDate',
      message: `A booking is at most ${maxBookingDays} days; split longer work into phases`,
    };
  return null;
}

function capacityIssue(facts: BookingFacts): BookingIssue | null {
  const full: CalendarDate[] = [];
  for (const day of daysOf(facts)) {
    const jobs = new Set([facts.jobId]);
    for (const other of facts.otherBookings)
      if (rangesOverlap(other, { startDate: day, endDate: day })) jobs.add(other.jobId);
    if (jobs.size > facts.crew.jobsPerDay) full.push(day);
  }
  if (full.length === 0) return null;
  const capacity = facts.crew.jobsPerDay === 1 ? 'one job' : `${facts.crew.jobsPerDay} jobs`;
  return {
    code: 'over-capacity',
    path: 'startDate',
    message: `${facts.crew.name} takes ${capacity} a day and is already booked on ${listDays(full)}`,
  };
}

function workingDayIssue(facts: BookingFacts): BookingIssue | null {
  const off = daysOf(facts).filter((day) => !facts.crew.workingDays.includes(weekdayOf(day)));
  if (off.length === 0) return null;
  return {
    code: 'not-a-working-day',
    path: 'startDate',
    message: `${listDays(off)} ${off.length === 1 ? 'is not a working day' : 'are not working days'} of ${facts.crew.name}`,
  };
}

/** The digging phase against the job's tickets (newest first; the first that allows it wins). */
function locateIssues(facts: BookingFacts, out: BookingEvaluation): void {
  if (facts.phase !== diggingPhase) return;
  const start = startOfLocalDay(facts.startDate, facts.timeZone);
  const usable = facts.tickets.filter((t) => t.status !== 'conflict');
  if (facts.tickets.length === 0) {
    out.refusals.push({
      code: 'no-locate-ticket',
      path: 'startDate',
      message:
        'Tear-out and base breaks ground: record the locate ticket for this job before booking it',
    });
    return;
  }
  if (usable.length === 0) {
    out.refusals.push({
      code: 'locate-conflict',
      path: 'startDate',
      message:
        'The locate ticket reports a conflict: resolve it with the utility operators and call in a new ticket before digging',
    });
    return;
  }
  let firstRefusal: BookingIssue | null = null;
  for (const ticket of usable) {
    const check = checkDigDate(ticket, start);
    const opensThatDay =
      !check.ok &&
      check.reason === 'before-earliest-dig' &&
      localDateOf(new Date(ticket.earliestDigAt), facts.timeZone) === facts.startDate;
    if (check.ok || opensThatDay) {
      if (opensThatDay && !check.ok)
        out.warnings.push({
          code: 'dig-opens-later-that-day',
          path: 'startDate',
          message: check.message,
        });
      ticketWarnings(facts, ticket, out);
      return;
    }
    firstRefusal ??= { code: check.reason, path: 'startDate', message: check.message };
  }
  if (firstRefusal) out.refusals.push(firstRefusal);
}

function ticketWarnings(facts: BookingFacts, ticket: BookingTicket, out: BookingEvaluation): void {
  const expires = new Date(ticket.expiresAt);
  if (effectiveLocateStatus(ticket.status, expires, facts.now) === 'requested')
    out.warnings.push({
      code: 'locate-not-clear',
      path: 'startDate',
      message:
        'The locate ticket is not marked clear yet: check the operators have answered before digging',
    });
  const afterLastDay = startOfLocalDay(addCalendarDays(facts.endDate, 1), facts.timeZone);
  if (expires < afterLastDay)
    out.warnings.push({
      code: 'ticket-expires-during-booking',
      path: 'endDate',
      message: `The locate ticket expires on ${dayWords(localDateOf(expires, facts.timeZone))}, before this booking ends on ${dayWords(facts.endDate)}: renew it if digging goes on`,
    });
}

function cancellationIssue(facts: BookingFacts): BookingIssue | null {
  const endsAt = facts.cancellationEndsAt;
  if (!endsAt || startOfLocalDay(facts.startDate, facts.timeZone) >= endsAt) return null;
  // The period ends at local midnight, so its last day is the day of the instant just before.
  const lastDay = localDateOf(new Date(endsAt.getTime() - 1), facts.timeZone);
  return {
    code: 'cancellation-period',
    path: 'startDate',
    message: `The buyer may cancel until the end of ${dayWords(lastDay)}: no work may be booked before ${dayWords(localDateOf(endsAt, facts.timeZone))}`,
  };
}

function turfIssue(facts: BookingFacts): BookingIssue | null {
  if (facts.phase !== turfPhase || !facts.turf) return null;
  if (!facts.turf.reserved)
    return {
      code: 'turf-not-reserved',
      path: 'phase',
      message:
        "The job's turf is not reserved yet: reserve it from one dye lot before the crew lays it",
    };
  if (facts.turf.shortFt > 0)
    return {
      code: 'turf-short',
      path: 'phase',
      message: `${Math.ceil(facts.turf.shortFt)} ft of the job's turf is still to be ordered`,
    };
  return null;
}

/** Every rule at once; the caller saves only when `refusals` is empty. */
export function evaluateBooking(facts: BookingFacts): BookingEvaluation {
  const out: BookingEvaluation = { refusals: [], warnings: [] };
  const range = checkBookingRange(facts);
  if (range) return { refusals: [range], warnings: [] };
  if (!bookableJobStatuses.includes(facts.jobStatus))
    out.refusals.push({
      code: 'job-not-bookable',
      path: 'jobId',
      message:
        facts.jobStatus === 'lead' || facts.jobStatus === 'estimated'
          ? `The job is ${jobStatusLabels[facts.jobStatus]}: book crews once the customer has accepted the estimate`
          : `The job is ${jobStatusLabels[facts.jobStatus]}: it can no longer be booked`,
    });
  const capacity = capacityIssue(facts);
  if (capacity) out.refusals.push(capacity);
  const cancellation = cancellationIssue(facts);
  if (cancellation) out.refusals.push(cancellation);
  locateIssues(facts, out);
  const workingDay = workingDayIssue(facts);
  if (workingDay) out.warnings.push(workingDay);
  const turf = turfIssue(facts);
  if (turf) out.warnings.push(turf);
  return out;
}
