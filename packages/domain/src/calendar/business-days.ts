import type { CalendarDate } from './calendar.js';
import { addCalendarDays, weekdayOf } from './calendar.js';
import type { HolidayRule } from './holidays.js';
import { holidayNameOf } from './holidays.js';

/** Gives the holiday's name when `date` is one, else null (a dataset such as `date-holidays`). */
export type HolidayLookup = (date: CalendarDate) => string | null;

export interface BusinessCalendar {
  /** Weekdays that are never business days (0 = Sunday … 6 = Saturday). */
  closedWeekdays: readonly number[];
  /** Holidays as rules (a statute's own list), or a lookup into a dataset. */
  holidays: readonly HolidayRule[] | HolidayLookup;
}

/** The holiday `date` is in `calendar`, or null (weekends are not holidays). */
export function holidayNameOn(date: CalendarDate, calendar: BusinessCalendar): string | null {
  const { holidays } = calendar;
  return typeof holidays === 'function' ? holidays(date) : holidayNameOf(date, holidays);
}

export function isBusinessDay(date: CalendarDate, calendar: BusinessCalendar): boolean {
  return (
    !calendar.closedWeekdays.includes(weekdayOf(date)) && holidayNameOn(date, calendar) === null
  );
}

/**
 * The `count`th business day after `date` (the day itself never counts, whatever it is), and
 * the business days on the way, in order.
 */
export function businessDaysAfter(
  date: CalendarDate,
  count: number,
  calendar: BusinessCalendar,
): CalendarDate[] {
  if (!Number.isInteger(count) || count < 1)
    throw new RangeError('count must be a whole number ≥ 1');
  const days: CalendarDate[] = [];
  let day = date;
  while (days.length < count) {
    day = addCalendarDays(day, 1);
    if (isBusinessDay(day, calendar)) days.push(day);
  }
  return days;
}
