// Holidays written as rules ("the 4th Thursday of November"), so a jurisdiction's list is data
// and any year's dates follow from it.
import type { CalendarDate } from './calendar.js';
import { addCalendarDays, calendarDate, weekdayOf } from './calendar.js';

/**
 * One holiday: a fixed date, or the nth (or last, n = -1) weekday of a month, optionally moved
 * `offsetDays` from it (Florida's "Friday after Thanksgiving" is Thanksgiving + 1). Plain JSON, so
 * a rule list can be stored.
 */
export type HolidayRule =
  | { name: string; kind: 'fixed'; month: number; day: number }
  | {
      name: string;
      kind: 'weekday';
      month: number;
      weekday: number;
      nth: number;
      offsetDays?: number;
    };

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** The date of `rule` in `year`. Fixed dates count on the day itself, not an observed weekday. */
export function holidayDate(rule: HolidayRule, year: number): CalendarDate {
  if (rule.kind === 'fixed') return calendarDate(year, rule.month, rule.day);
  const offset = rule.offsetDays ?? 0;
  if (rule.nth > 0) {
    const first = calendarDate(year, rule.month, 1);
    const shift = (rule.weekday - weekdayOf(first) + 7) % 7;
    return addCalendarDays(first, shift + 7 * (rule.nth - 1) + offset);
  }
  const last = calendarDate(year, rule.month, daysInMonth(year, rule.month));
  const back = (weekdayOf(last) - rule.weekday + 7) % 7;
  return addCalendarDays(last, offset - back);
}

/** Whether `date` is one of `rules`' holidays. */
export function isHoliday(date: CalendarDate, rules: readonly HolidayRule[]): boolean {
  return holidayNameOf(date, rules) !== null;
}

/**
 * The name of the holiday `date` is, or null. With `observeWeekends`, a holiday on a Saturday is
 * kept on the Friday before and one on a Sunday on the Monday after (the usual observance rule;
 * a statute that says so names it). An offset holiday is looked up in the year before too, so
 * one that crosses New Year would still be found.
 */
export function holidayNameOf(
  date: CalendarDate,
  rules: readonly HolidayRule[],
  observeWeekends = false,
): string | null {
  const year = Number(date.slice(0, 4));
  for (const rule of rules) {
    for (const y of [year, year + 1, year - 1]) {
      const actual = holidayDate(rule, y);
      if (actual === date) return rule.name;
      if (!observeWeekends) continue;
      const weekday = weekdayOf(actual);
      const observed =
        weekday === 6
          ? addCalendarDays(actual, -1)
          : weekday === 0
            ? addCalendarDays(actual, 1)
            : null;
      if (observed === date) return `${rule.name} (observed)`;
    }
  }
  return null;
}
