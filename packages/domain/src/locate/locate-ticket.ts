// A locate ticket's times from the notice instant, the company's zone and its region's rule:
// the earliest lawful start, the latest start the notice covers, and the expiry, as ISO instants,
// with the counting in words.
import type { BusinessCalendar } from '../calendar/business-days.js';
import { businessDaysAfter } from '../calendar/business-days.js';
import type { CalendarDate } from '../calendar/calendar.js';
import {
  addCalendarDays,
  localDateOf,
  localInstantAt,
  localMinuteOf,
} from '../calendar/calendar.js';
import { holidayNameOf } from '../calendar/holidays.js';
import { publicHolidayLookup } from '../calendar/public-holidays.js';
import { earliestDigStart } from './earliest-dig.js';
import { dayLabel } from './format.js';
import type { LocateDays, LocateRule } from './rules.js';
import { selectLocateRule } from './select-rule.js';

export interface LocateTicketInput {
  /** When the notice was given (an instant). */
  calledAt: Date | string;
  /** The company's IANA zone: days and times are counted there. */
  timeZone: string;
  /** The company's region (`US-TX`, `TX`); null or unknown → the generic default. */
  region: string | null | undefined;
  /** The company's own rules, tried before the built-in ones. */
  companyRules?: readonly LocateRule[];
}

/** What a ticket needs for `checkDigDate`; all instants ISO 8601 in UTC. */
export interface LocateTicketTimes {
  calledAt: string;
  earliestDigAt: string;
  expiresAt: string;
  /** Digging must start by then or the notice was too early; null = no limit. */
  latestStartAt: string | null;
  maxAhead: LocateDays | null;
  timeZone: string;
}

export interface LocateTicketComputation extends LocateTicketTimes {
  rule: {
    id: string;
    region: string | null;
    isDefault: boolean;
    title: string;
    source: string;
    lifeIsCompanyDefault: boolean;
  };
  /** The counting in one line, e.g. "Notice Sat 2025-09-06 10:00: … → earliest dig …". */
  explanation: string;
  steps: string[];
}

/** The business calendar a rule counts with. */
export function calendarOfRule(rule: LocateRule): BusinessCalendar {
  const { holidays } = rule;
  if (holidays.kind === 'dataset') {
    const { country, state, types } = holidays;
    return {
      closedWeekdays: rule.closedWeekdays,
      holidays: publicHolidayLookup(state ? { country, state, types } : { country, types }),
    };
  }
  return {
    closedWeekdays: rule.closedWeekdays,
    holidays: (date) => holidayNameOf(date, holidays.holidays, holidays.observeWeekends),
  };
}

/** The last day of a span counted from `from` (the day itself not counted). */
function spanEnd(from: CalendarDate, span: LocateDays, calendar: BusinessCalendar): CalendarDate {
  if (span.unit === 'calendar') return addCalendarDays(from, span.days);
  return businessDaysAfter(from, span.days, calendar).at(-1) ?? from;
}

export function computeLocateTicket(input: LocateTicketInput): LocateTicketComputation {
  const calledAt = new Date(input.calledAt);
  if (Number.isNaN(calledAt.getTime())) throw new RangeError('calledAt is not a valid instant');
  const { timeZone } = input;
  const noticeDate = localDateOf(calledAt, timeZone);
  const selected = selectLocateRule(input.region, noticeDate, input.companyRules);
  const { rule } = selected;
  const calendar = calendarOfRule(rule);

  const start = earliestDigStart(
    { date: noticeDate, minute: localMinuteOf(calledAt, timeZone) },
    rule.notice,
    calendar,
  );
  const lastValidDay = spanEnd(noticeDate, rule.life, calendar);
  const latestStartDay = rule.maxAhead ? spanEnd(noticeDate, rule.maxAhead, calendar) : null;
  const steps = [...start.steps];
  steps.push(
    `valid through ${dayLabel(lastValidDay)} (${rule.life.days} ${rule.life.unit} days${rule.life.isCompanyDefault ? ', company default' : ''})`,
  );
  // Worth saying only when the notice's lead limit ends before its life does.
  if (latestStartDay && latestStartDay < lastValidDay)
    steps.push(
      `start by ${dayLabel(latestStartDay)} (notice at most ${rule.maxAhead?.days} ${rule.maxAhead?.unit} days ahead)`,
    );
  const lead = selected.isDefault
    ? `No locate rule on file for ${selected.region ?? 'a company without a region'}: using the ${rule.title}. `
    : '';
  return {
    calledAt: calledAt.toISOString(),
    earliestDigAt: localInstantAt(start.at.date, start.at.minute, timeZone).toISOString(),
    // Valid through the whole last day: it ends at the next local midnight.
    expiresAt: localInstantAt(lastValidDay, 1440, timeZone).toISOString(),
    latestStartAt: latestStartDay
      ? localInstantAt(latestStartDay, 1440, timeZone).toISOString()
      : null,
    maxAhead: rule.maxAhead,
    timeZone,
    rule: {
      id: rule.id,
      region: selected.region,
      isDefault: selected.isDefault,
      title: rule.title,
      source: rule.source,
      lifeIsCompanyDefault: rule.life.isCompanyDefault,
    },
    explanation: lead + steps.join(' → '),
    steps,
  };
}
