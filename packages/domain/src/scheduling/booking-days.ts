// Day ranges of bookings: inclusive `YYYY-MM-DD` ranges of calendar days in the company's zone.
import type { CalendarDate } from '../calendar/calendar.js';
import { addCalendarDays } from '../calendar/calendar.js';

export interface DayRange {
  startDate: CalendarDate;
  /** Inclusive: a one-day booking has endDate = startDate. */
  endDate: CalendarDate;
}

/** Every day of the range, in order. ISO dates compare as strings. */
export function daysOf(range: DayRange): CalendarDate[] {
  const days: CalendarDate[] = [];
  for (let day = range.startDate; day <= range.endDate; day = addCalendarDays(day, 1))
    days.push(day);
  return days;
}

/** How many days the range covers (1 for a one-day booking; 0 when it runs backwards). */
export function dayCount(range: DayRange): number {
  if (range.endDate < range.startDate) return 0;
  const ms = Date.parse(`${range.endDate}T00:00:00Z`) - Date.parse(`${range.startDate}T00:00:00Z`);
  return Math.round(ms / 86_400_000) + 1;
}

export function rangesOverlap(a: DayRange, b: DayRange): boolean {
  return a.startDate <= b.endDate && b.startDate <= a.endDate;
}
