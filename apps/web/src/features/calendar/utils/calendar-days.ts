// Calendar days on the web side: FullCalendar gives local Dates with exclusive ends; the API
// speaks inclusive `YYYY-MM-DD` days in the company's zone.
import { addCalendarDays } from '@seamwright/domain';
import type { BookingView } from '@seamwright/shared';

/** The local calendar day of a Date FullCalendar made from an all-day string. */
export function dayOf(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** FullCalendar's exclusive end (or none, a one-day event) as our inclusive last day. */
export function lastDayOf(start: Date, end: Date | null): string {
  return end ? addCalendarDays(dayOf(end), -1) : dayOf(start);
}

export interface CalendarEventInput {
  id: string;
  title: string;
  start: string;
  end: string;
  allDay: true;
  backgroundColor: string;
  borderColor: string;
  textColor: string;
  extendedProps: { booking: BookingView };
}

/** A booking as an all-day event; the crew's name leads the text so colour is not the only cue. */
export function toEvent(booking: BookingView): CalendarEventInput {
  return {
    id: booking.id,
    title: `${booking.crew.name} · ${booking.phaseLabel} · ${booking.job.title}`,
    start: booking.startDate,
    end: addCalendarDays(booking.endDate, 1),
    allDay: true,
    backgroundColor: booking.crew.colourHex,
    borderColor: booking.crew.colourHex,
    textColor: '#ffffff',
    extendedProps: { booking },
  };
}

export const calendarViews = { month: 'dayGridMonth', week: 'dayGridWeek' } as const;
export type CalendarViewName = keyof typeof calendarViews;
