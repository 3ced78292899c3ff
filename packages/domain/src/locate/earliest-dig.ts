// The earliest lawful start after a one-call notice, in local wall-clock time, with the steps of
// the counting in words. Day arithmetic runs on calendar dates; the caller turns the answer into
// an instant in the company's zone.
import type { BusinessCalendar } from '../calendar/business-days.js';
import { businessDaysAfter, holidayNameOn, isBusinessDay } from '../calendar/business-days.js';
import type { CalendarDate } from '../calendar/calendar.js';
import { addCalendarDays, weekdayOf } from '../calendar/calendar.js';
import { dayLabel, durationLabel, parseTimeOfDay, timeLabel } from './format.js';
import type { LocateNotice } from './rules.js';

/** A local day and minute of that day (0–1439). */
export interface LocalMoment {
  date: CalendarDate;
  minute: number;
}

export interface DigStart {
  at: LocalMoment;
  steps: string[];
}

function notCountedWords(date: CalendarDate, calendar: BusinessCalendar): string {
  const holiday = holidayNameOn(date, calendar);
  return holiday ? `${dayLabel(date)} (${holiday})` : dayLabel(date);
}

/** The days after `from` up to and including `to` that are not counted, in words. */
function skippedBetween(
  from: CalendarDate,
  to: CalendarDate,
  calendar: BusinessCalendar,
): string[] {
  const skipped: string[] = [];
  for (let day = addCalendarDays(from, 1); day <= to; day = addCalendarDays(day, 1))
    if (!isBusinessDay(day, calendar)) skipped.push(notCountedWords(day, calendar));
  return skipped;
}

function ordinal(n: number): string {
  const suffix = n % 10 === 1 && n !== 11 ? 'st' : n % 10 === 2 && n !== 12 ? 'nd' : 'th';
  return `${n}${n % 10 === 3 && n !== 13 ? 'rd' : suffix}`;
}

function fullDays(notice: LocalMoment, days: number, calendar: BusinessCalendar): DigStart {
  const counted = businessDaysAfter(notice.date, days, calendar);
  const last = counted[counted.length - 1] ?? notice.date;
  const start = addCalendarDays(last, 1);
  const steps = [
    `Notice ${dayLabel(notice.date)} ${timeLabel(notice.minute)} (the notice day is not counted)`,
  ];
  const skipped = skippedBetween(notice.date, last, calendar);
  if (skipped.length > 0) steps.push(`not business days: ${skipped.join(', ')}`);
  steps.push(`${days} full business days: ${counted.map(dayLabel).join(', ')}`);
  steps.push(`earliest dig ${dayLabel(start)} 00:00`);
  return { at: { date: start, minute: 0 }, steps };
}

function saturdayNotice(
  notice: LocalMoment,
  rule: { countedDay: number; time: string },
  calendar: BusinessCalendar,
): DigStart {
  const counted = businessDaysAfter(notice.date, rule.countedDay, calendar);
  const day = counted[counted.length - 1] ?? notice.date;
  const minute = parseTimeOfDay(rule.time);
  const steps = [
    `Notice ${dayLabel(notice.date)} ${timeLabel(notice.minute)}: a Saturday notice may dig from ${rule.time} on the ${ordinal(rule.countedDay)} counted day after it`,
  ];
  const skipped = skippedBetween(notice.date, day, calendar);
  if (skipped.length > 0) steps.push(`not counted: ${skipped.join(', ')}`);
  steps.push(`counted: ${counted.map(dayLabel).join(', ')}`);
  steps.push(`earliest dig ${dayLabel(day)} ${rule.time}`);
  return { at: { date: day, minute }, steps };
}

function countedHours(notice: LocalMoment, hours: number, calendar: BusinessCalendar): DigStart {
  const steps = [
    `Notice ${dayLabel(notice.date)} ${timeLabel(notice.minute)}: ${hours} h of counted days`,
  ];
  let left = hours * 60;
  let date = notice.date;
  let minute = notice.minute;
  const skipped: string[] = [];
  const flushSkipped = (): void => {
    if (skipped.length > 0) steps.push(`not counted: ${skipped.splice(0).join(', ')}`);
  };
  // The notice day itself may be one that is not counted: the clock then starts at the next
  // counted day's midnight.
  while (!isBusinessDay(date, calendar)) {
    skipped.push(notCountedWords(date, calendar));
    date = addCalendarDays(date, 1);
    minute = 0;
  }
  for (;;) {
    flushSkipped();
    const available = 1440 - minute;
    if (left <= available) {
      const end = minute + left;
      steps.push(
        `${dayLabel(date)} ${timeLabel(minute)}–${timeLabel(end)}: ${durationLabel(left)}`,
      );
      const at =
        end === 1440 ? { date: addCalendarDays(date, 1), minute: 0 } : { date, minute: end };
      steps.push(`earliest dig ${dayLabel(at.date)} ${timeLabel(at.minute)}`);
      return { at, steps };
    }
    steps.push(`${dayLabel(date)} ${timeLabel(minute)}–24:00: ${durationLabel(available)}`);
    left -= available;
    date = addCalendarDays(date, 1);
    minute = 0;
    while (!isBusinessDay(date, calendar)) {
      skipped.push(notCountedWords(date, calendar));
      date = addCalendarDays(date, 1);
    }
  }
}

/** The earliest local moment digging may start after a notice given at `notice`. */
export function earliestDigStart(
  notice: LocalMoment,
  rule: LocateNotice,
  calendar: BusinessCalendar,
): DigStart {
  if (rule.kind === 'full-days') return fullDays(notice, rule.days, calendar);
  if (rule.saturdayNotice && weekdayOf(notice.date) === 6)
    return saturdayNotice(notice, rule.saturdayNotice, calendar);
  return countedHours(notice, rule.hours, calendar);
}
