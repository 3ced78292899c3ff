// Words for the explanation: days as `Sat 2025-09-06`, times as `11:59`.
import type { CalendarDate } from '../calendar/calendar.js';
import { weekdayOf } from '../calendar/calendar.js';

const weekdayNames = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

export function dayLabel(date: CalendarDate): string {
  return `${weekdayNames[weekdayOf(date)] ?? ''} ${date}`;
}

export function timeLabel(minute: number): string {
  const hours = Math.floor(minute / 60);
  return `${String(hours).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
}

/** `HH:mm` → minute of the day; throws on anything else (rules are data, so check them). */
export function parseTimeOfDay(value: string): number {
  const match = /^(\d{2}):(\d{2})$/.exec(value);
  const hours = Number(match?.[1]);
  const minutes = Number(match?.[2]);
  if (!match || hours > 23 || minutes > 59) throw new RangeError(`Bad time of day: ${value}`);
  return hours * 60 + minutes;
}

/** A length of time in minutes as `10 h` or `9 h 30 min`. */
export function durationLabel(minutes: number): string {
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}
