// One-call ("811") notice rules as dated, region-tagged data (TRADE.md §6). A change in the law
// is a new entry with its own `effectiveFrom`; the old one gets an `effectiveUntil`, so a ticket
// is always judged by the rule in force on the day it was called in. Every field is plain JSON,
// so a company's own rule can be stored and read back in the same shape. Not legal advice.
import type { HolidayRule } from '../calendar/holidays.js';
import type { PublicHolidaySet } from '../calendar/public-holidays.js';

/** Days that are not counted: a `date-holidays` list, or the statute's own list. */
export type LocateHolidays =
  | ({ kind: 'dataset' } & PublicHolidaySet)
  | { kind: 'statute'; holidays: HolidayRule[]; observeWeekends: boolean };

/** How long before digging the notice must be given. */
export type LocateNotice =
  /**
   * Hours of counted days (whole days not counted are skipped, the clock runs on through the
   * counted ones). `saturdayNotice`: a notice given on a Saturday allows digging from `time` on
   * the `countedDay`th counted day after it instead.
   */
  | {
      kind: 'hours';
      hours: number;
      saturdayNotice?: { countedDay: number; time: string };
    }
  /** Whole business days after the notice day (which never counts); dig from the next midnight. */
  | { kind: 'full-days'; days: number };

/** A span of days: calendar days, or business days of the rule's own calendar. */
export interface LocateDays {
  days: number;
  unit: 'calendar' | 'business';
}

export interface LocateRule {
  /** Stable name, stored on the ticket. */
  id: string;
  /** `US-TX`; `*` for the generic default. */
  region: string;
  title: string;
  /** First and last day (inclusive, null = still in force) a notice falls under the rule. */
  effectiveFrom: string;
  effectiveUntil: string | null;
  /** Weekdays never counted (0 = Sunday … 6 = Saturday). */
  closedWeekdays: number[];
  holidays: LocateHolidays;
  notice: LocateNotice;
  /** At most this long between the notice and the start of digging; null = no limit. */
  maxAhead: LocateDays | null;
  /**
   * How long the ticket stays valid, counted from the notice day; valid through the end of the
   * last day. `isCompanyDefault` marks a value that is our choice, not the statute's.
   */
  life: LocateDays & { isCompanyDefault: boolean };
  /** Where the values come from (TRADE.md §11 labels), and how sure they are. */
  source: string;
}

const weekends = [0, 6];

/** Fla. Stat. §556.102 names its own business-day holidays (TRADE.md §6, [S99]). */
export const floridaOneCallHolidays: HolidayRule[] = [
  { name: "New Year's Day", kind: 'fixed', month: 1, day: 1 },
  { name: 'Martin Luther King Jr. Day', kind: 'weekday', month: 1, weekday: 1, nth: 3 },
  { name: 'Memorial Day', kind: 'weekday', month: 5, weekday: 1, nth: -1 },
  { name: 'Independence Day', kind: 'fixed', month: 7, day: 4 },
  { name: 'Labor Day', kind: 'weekday', month: 9, weekday: 1, nth: 1 },
  { name: 'Thanksgiving Day', kind: 'weekday', month: 11, weekday: 4, nth: 4 },
  {
    name: 'Friday after Thanksgiving',
    kind: 'weekday',
    month: 11,
    weekday: 4,
    nth: 4,
    offsetDays: 1,
  },
  { name: 'Christmas Eve', kind: 'fixed', month: 12, day: 24 },
  { name: 'Christmas Day', kind: 'fixed', month: 12, day: 25 },
];

const publicOnly = ['public'] as const;

export const locateRules: readonly LocateRule[] = [
  {
    id: 'us-tx-251-151',
    region: 'US-TX',
    title: 'Texas Utilities Code §251.151 (one-call notice)',
    // Effective date of the current text: from memory (the chapter dates from 1997).
    effectiveFrom: '1997-09-01',
    effectiveUntil: null,
    closedWeekdays: weekends,
    holidays: { kind: 'dataset', country: 'US', state: 'TX', types: [...publicOnly] },
    notice: { kind: 'hours', hours: 48, saturdayNotice: { countedDay: 2, time: '11:59' } },
    maxAhead: { days: 14, unit: 'calendar' },
    // 16 TAC §18.3(f) counts the 14 days for pipelines; we count from the notice day, the
    // earlier (safer) end.
    life: { days: 14, unit: 'calendar', isCompanyDefault: false },
    source:
      'Tex. Util. Code §251.151(a)–(b), §251.157 [S92] [S93]; ticket life 16 TAC §18.3(f) [S94]; legal holidays from the date-holidays US-TX public list',
  },
  {
    id: 'us-ca-4216',
    region: 'US-CA',
    title: 'California Government Code §4216 et seq.',
    // Effective date of the current text: from memory.
    effectiveFrom: '2017-01-01',
    effectiveUntil: null,
    closedWeekdays: weekends,
    holidays: { kind: 'dataset', country: 'US', state: 'CA', types: [...publicOnly] },
    notice: { kind: 'full-days', days: 2 },
    maxAhead: { days: 14, unit: 'calendar' },
    life: { days: 28, unit: 'calendar', isCompanyDefault: false },
    source:
      'Cal. Gov. Code §4216.2 [S96], 28-day ticket §4216 [S97]; working days skip federal and state holidays (date-holidays US-CA public list)',
  },
  {
    id: 'us-fl-556',
    region: 'US-FL',
    title: 'Florida Statutes chapter 556 (Underground Facility Damage Prevention and Safety Act)',
    // Effective date of the current text: from memory.
    effectiveFrom: '2004-01-01',
    effectiveUntil: null,
    closedWeekdays: weekends,
    holidays: { kind: 'statute', holidays: floridaOneCallHolidays, observeWeekends: true },
    notice: { kind: 'full-days', days: 2 },
    maxAhead: null,
    life: { days: 30, unit: 'calendar', isCompanyDefault: false },
    source:
      'Fla. Stat. §556.102 (business days and their holidays, weekend observance), §556.105 (2 full business days, 30-day notice) [S99]',
  },
  {
    id: 'us-ny-753',
    region: 'US-NY',
    title: 'New York 16 NYCRR Part 753',
    // Effective date of the current text: from memory.
    effectiveFrom: '2000-01-01',
    effectiveUntil: null,
    closedWeekdays: weekends,
    holidays: { kind: 'dataset', country: 'US', state: 'NY', types: [...publicOnly] },
    notice: { kind: 'full-days', days: 2 },
    maxAhead: { days: 10, unit: 'business' },
    // TRADE.md gives no ticket life for New York: our default is the same 10 working days as
    // the longest lead allowed, so a ticket is never trusted past the window it could be called in.
    life: { days: 10, unit: 'business', isCompanyDefault: true },
    source:
      '16 NYCRR §753-3.1 via the Rule 753 synopsis [S103] (2–10 working days, call day not counted); ticket life is a company default; holidays from the date-holidays US-NY public list',
  },
  {
    id: 'us-ga-2016',
    region: 'US-GA',
    title: 'Georgia Dig Law (O.C.G.A. §25-9), as amended 1 July 2016',
    effectiveFrom: '2016-07-01',
    effectiveUntil: null,
    closedWeekdays: weekends,
    holidays: { kind: 'dataset', country: 'US', state: 'GA', types: [...publicOnly] },
    notice: { kind: 'full-days', days: 3 },
    maxAhead: null,
    life: { days: 30, unit: 'calendar', isCompanyDefault: false },
    source:
      'Georgia one-call public guidance [S105] [S106] (3 business days; ticket 30 calendar days since 1 July 2016); holidays from the date-holidays US-GA public list',
  },
];

/**
 * Used when the company's region has no rule: 2 full business days (the most common rule in
 * TRADE.md §6 — CA, FL, NY, NE; the Indiana counting example [S111]) and federal holidays. The
 * 14-day life is our default (the shortest life in TRADE.md §6), so a re-ticket is asked early.
 */
export const defaultLocateRule: LocateRule = {
  id: 'default-2-business-days',
  region: '*',
  title: 'default rule of 2 full business days and federal holidays',
  effectiveFrom: '1900-01-01',
  effectiveUntil: null,
  closedWeekdays: weekends,
  holidays: { kind: 'dataset', country: 'US', types: [...publicOnly] },
  notice: { kind: 'full-days', days: 2 },
  maxAhead: null,
  life: { days: 14, unit: 'calendar', isCompanyDefault: true },
  source:
    'Seamwright default (common practice, TRADE.md §6; Indiana example [S111]); federal holidays from the date-holidays US public list; check the state one-call law',
};
