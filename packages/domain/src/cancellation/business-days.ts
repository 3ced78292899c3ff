import type { CalendarDate } from './calendar.js';
import { addCalendarDays, weekdayOf } from './calendar.js';
import type { HolidayRule } from './holidays.js';
import { isHoliday } from './holidays.js';

export interface BusinessCalendar {
  /** Weekdays that are never business days (0 = Sunday … 6 = Saturday). */
  closedWeekdays: readonly number[];
  holidays: readonly HolidayRule[];
}

export function isBusinessDay(date: CalendarDate, calendar: BusinessCalendar): boolean {
  return !calendar.closedWeekdays.includes(weekdayOf(date)) && !isHoliday(date, calendar.holidays);
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
