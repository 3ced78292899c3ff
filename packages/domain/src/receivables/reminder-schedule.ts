// Reminders for late payers: a company's schedule is a list of steps, each a number of days
// relative to the invoice's due date (negative: before it). This module says which steps are
// due for one invoice on one day; claiming and sending them is the API's worker.
import { addCalendarDays, calendarDaysBetween } from '../calendar/calendar.js';
import type { CalendarDate } from '../calendar/calendar.js';

/** Offsets in days from the due date: 3 days before, on the day, then 7, 14 and 30 days late. */
export const defaultReminderOffsets: readonly number[] = [-3, 0, 7, 14, 30];

/** Reminder steps never reach further than a year either side of the due date. */
export const maxReminderOffsetDays = 365;

export interface ReminderStep {
  offsetDays: number;
  /** The calendar day the step becomes due. */
  dueOn: CalendarDate;
}

/** Invoice states whose reminders still run; paid and void invoices stop theirs. */
export const remindableInvoiceStatuses = ['sent', 'partly_paid', 'overdue'] as const;

/** The schedule's steps for an invoice due on `dueDate`, earliest first, each offset once. */
export function reminderSteps(offsets: readonly number[], dueDate: CalendarDate): ReminderStep[] {
  return [...new Set(offsets)]
    .sort((a, b) => a - b)
    .map((offsetDays) => ({ offsetDays, dueOn: addCalendarDays(dueDate, offsetDays) }));
}

/**
 * The steps due on `today` that have not been sent yet. Only the LATEST due step is returned
 * when several were missed (an invoice sent late, a worker that was down for a week): the
 * customer gets one message that says where things stand, not a burst of five. Steps that
 * fall before the day the invoice was sent are never due, so a late-sent invoice does not
 * open with a "3 days before due" message after the due date.
 */
export function dueReminderStep(input: {
  offsets: readonly number[];
  dueDate: CalendarDate;
  sentOn: CalendarDate;
  today: CalendarDate;
  alreadySentOffsets: readonly number[];
}): ReminderStep | null {
  const sent = new Set(input.alreadySentOffsets);
  const latestSent =
    input.alreadySentOffsets.length > 0 ? Math.max(...input.alreadySentOffsets) : null;
  const due = reminderSteps(input.offsets, input.dueDate).filter(
    (step) =>
      calendarDaysBetween(step.dueOn, input.today) >= 0 &&
      calendarDaysBetween(input.sentOn, step.dueOn) >= 0 &&
      !sent.has(step.offsetDays) &&
      (latestSent === null || step.offsetDays > latestSent),
  );
  return due.at(-1) ?? null;
}

/** Why a schedule cannot be saved, or null: offsets must be whole days within a year. */
export function reminderScheduleProblem(offsets: readonly number[]): string | null {
  if (offsets.length === 0) return null;
  if (offsets.length > 12) return 'A schedule has at most 12 steps';
  for (const offset of offsets) {
    if (!Number.isInteger(offset)) return `${offset} is not a whole number of days`;
    if (Math.abs(offset) > maxReminderOffsetDays)
      return `${offset} days is more than a year from the due date`;
  }
  if (new Set(offsets).size !== offsets.length) return 'Each step must be a different day';
  return null;
}

/**
 * The day the worker should next look at an invoice: the earliest step after the latest one
 * sent that does not fall before the day the invoice was sent, or null when none is left. On
 * that day dueReminderStep picks the step to send (the latest due one, should days be missed),
 * so the two always agree: a day returned here is a day on which a step is due.
 */
export function nextReminderOn(input: {
  offsets: readonly number[];
  dueDate: CalendarDate;
  sentOn: CalendarDate;
  alreadySentOffsets: readonly number[];
}): CalendarDate | null {
  const latestSent =
    input.alreadySentOffsets.length > 0 ? Math.max(...input.alreadySentOffsets) : null;
  const next = reminderSteps(input.offsets, input.dueDate).find(
    (step) =>
      calendarDaysBetween(input.sentOn, step.dueOn) >= 0 &&
      (latestSent === null || step.offsetDays > latestSent),
  );
  return next?.dueOn ?? null;
}

/** The kind of message a step sends, which picks its template. */
export type ReminderKind = 'before_due' | 'due_day' | 'overdue';

export function reminderKindOf(offsetDays: number): ReminderKind {
  if (offsetDays < 0) return 'before_due';
  return offsetDays === 0 ? 'due_day' : 'overdue';
}

/** Words for a step, for lists and logs: "3 days before due", "on the due day", "7 days late". */
export function describeReminderOffset(offsetDays: number): string {
  if (offsetDays === 0) return 'on the due day';
  const days = Math.abs(offsetDays);
  const unit = days === 1 ? 'day' : 'days';
  return offsetDays < 0 ? `${days} ${unit} before due` : `${days} ${unit} overdue`;
}
