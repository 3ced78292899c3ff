// Holidays written as rules ("the 4th Thursday of November"), so a jurisdiction's list is data
// and any year's dates follow from it.
import type { CalendarDate } from './calendar.js';
import { addCalendarDays, calendarDate, weekdayOf } from './calendar.js';

/** One holiday: a fixed date, or the nth (or last, n = -1) weekday of a month. */
export type HolidayRule =
  | { name: string; kind: 'fixed'; month: number; day: number }
  | { name: string; kind: 'weekday'; month: number; weekday: number; nth: number };

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** The date of `rule` in `year`. Fixed dates count on the day itself, not an observed weekday. */
export function holidayDate(rule: HolidayRule, year: number): CalendarDate {
  if (rule.kind === 'fixed') return calendarDate(year, rule.month, rule.day);
  if (rule.nth > 0) {
    const first = calendarDate(year, rule.month, 1);
    const shift = (rule.weekday - weekdayOf(first) + 7) % 7;
    return addCalendarDays(first, shift + 7 * (rule.nth - 1));
  }
  const last = calendarDate(year, rule.month, daysInMonth(year, rule.month));
  const back = (weekdayOf(last) - rule.weekday + 7) % 7;
  return addCalendarDays(last, -back);
}

/** Whether `date` is one of `rules`' holidays. */
export function isHoliday(date: CalendarDate, rules: readonly HolidayRule[]): boolean {
  const year = Number(date.slice(0, 4));
  return rules.some((rule) => holidayDate(rule, year) === date);
}
