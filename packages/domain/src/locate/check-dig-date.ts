// Whether a booking may start digging on a ticket: not before the earliest lawful start, not
// after the ticket expires, and not later than the notice covers (a notice given too early).
import { addCalendarDays, localDateOf, localMinuteOf } from '../calendar/calendar.js';
import { dayLabel, timeLabel } from './format.js';
import type { LocateTicketTimes } from './locate-ticket.js';
import type { LocateDays } from './rules.js';

export type DigDateCheck =
  | { ok: true }
  | {
      ok: false;
      reason: 'before-earliest-dig' | 'ticket-expired' | 'notice-too-early';
      /** Says why, with the local days, for the calendar to show. */
      message: string;
    };

function localWords(instant: Date, timeZone: string): string {
  return `${dayLabel(localDateOf(instant, timeZone))} ${timeLabel(localMinuteOf(instant, timeZone))}`;
}

export function checkDigDate(
  ticket: Pick<LocateTicketTimes, 'earliestDigAt' | 'expiresAt' | 'latestStartAt' | 'timeZone'> & {
    /** The rule's lead limit, for the advice on when to call again. */
    maxAhead?: LocateDays | null;
  },
  bookingStartInstant: Date | string,
): DigDateCheck {
  const start = new Date(bookingStartInstant);
  if (Number.isNaN(start.getTime()))
    throw new RangeError('bookingStartInstant is not a valid instant');
  const { timeZone } = ticket;
  const earliest = new Date(ticket.earliestDigAt);
  if (start < earliest)
    return {
      ok: false,
      reason: 'before-earliest-dig',
      message: `Digging may not start before ${localWords(earliest, timeZone)}, the earliest lawful start of the locate ticket.`,
    };
  const expires = new Date(ticket.expiresAt);
  if (start >= expires)
    return {
      ok: false,
      reason: 'ticket-expired',
      message: `The locate ticket is valid until ${localWords(expires, timeZone)}: call in a new ticket for this start.`,
    };
  if (ticket.latestStartAt && start >= new Date(ticket.latestStartAt)) {
    const { maxAhead } = ticket;
    const startDate = localDateOf(start, timeZone);
    const callFrom =
      maxAhead?.unit === 'calendar'
        ? ` on or after ${dayLabel(addCalendarDays(startDate, -maxAhead.days))}`
        : maxAhead
          ? ` within ${maxAhead.days} working days of the start`
          : '';
    return {
      ok: false,
      reason: 'notice-too-early',
      message: `The notice was given too far ahead of a start on ${dayLabel(startDate)}${maxAhead ? ` (at most ${maxAhead.days} ${maxAhead.unit} days)` : ''}: call in a new ticket${callFrom}.`,
    };
  }
  return { ok: true };
}
