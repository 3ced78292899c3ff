// The buyer's right to cancel a sale made away from the seller's place of business, as dated,
// jurisdiction-tagged data (TRADE.md §8.2). Legal values change: a change is a new entry with
// its own `effectiveFrom`, and the old one gets an `effectiveUntil`, so an acceptance is always
// judged by the rule in force on the day it was signed. Nothing here is legal advice.
import type { CalendarDate } from '../calendar/calendar.js';
import type { HolidayRule } from '../calendar/holidays.js';

/** Where the buyer agreed to the sale. */
export type SalePlace =
  /** At the buyer's home (also: online, after the seller came to the home to sell). */
  | 'home'
  /** Another place that is not the seller's (a hotel room, a fair, a rented hall). */
  | 'elsewhere'
  /** At the seller's own place of business. */
  | 'office'
  /** Entirely by mail, telephone or online, with no visit by the seller. */
  | 'remote';

export interface CancellationRule {
  /** Stable name, stored on the acceptance. */
  id: string;
  /** `US` for a federal rule, `US-CA` for a state's. */
  jurisdiction: string;
  title: string;
  /** First and last day (inclusive, null = still in force) the rule applies to a sale. */
  effectiveFrom: CalendarDate;
  effectiveUntil: CalendarDate | null;
  /** The smallest price, in cents, that is covered at each place; a place not listed is not. */
  thresholdsCents: Partial<Record<SalePlace, number>>;
  /** The period: this many business days after the day of the sale, to midnight of the last. */
  businessDays: number;
  /** Days that are not business days: these weekdays (0 = Sunday) and these holidays. */
  closedWeekdays: readonly number[];
  holidays: readonly HolidayRule[];
  /** Where the values come from (TRADE.md §11 labels), and how sure they are. */
  source: string;
}

/**
 * The business holidays the FTC rule lists in 16 CFR §429.0 (TRADE.md §8.2: the list is recalled
 * from memory; S130 paraphrases the definition). Martin Luther King Jr. Day and Juneteenth are
 * federal holidays under 5 U.S.C. 6103 but are not in that list, so they count as business days.
 */
export const ftcBusinessHolidays: readonly HolidayRule[] = [
  { name: "New Year's Day", kind: 'fixed', month: 1, day: 1 },
  { name: "Washington's Birthday", kind: 'weekday', month: 2, weekday: 1, nth: 3 },
  { name: 'Memorial Day', kind: 'weekday', month: 5, weekday: 1, nth: -1 },
  { name: 'Independence Day', kind: 'fixed', month: 7, day: 4 },
  { name: 'Labor Day', kind: 'weekday', month: 9, weekday: 1, nth: 1 },
  { name: 'Columbus Day', kind: 'weekday', month: 10, weekday: 1, nth: 2 },
  { name: 'Veterans Day', kind: 'fixed', month: 11, day: 11 },
  { name: 'Thanksgiving Day', kind: 'weekday', month: 11, weekday: 4, nth: 4 },
  { name: 'Christmas Day', kind: 'fixed', month: 12, day: 25 },
];

const sundays = [0] as const;

export const cancellationRules: readonly CancellationRule[] = [
  {
    id: 'us-ftc-429-1972',
    jurisdiction: 'US',
    title: 'FTC Cooling-Off Rule (16 CFR Part 429), before the 2015 amendment',
    // The rule dates from 1972; its first effective day and the single $25 threshold for every
    // place away from the seller's are from memory (the 2015 rule raised the one for other places).
    effectiveFrom: '1974-06-07',
    effectiveUntil: '2015-03-12',
    thresholdsCents: { home: 2500, elsewhere: 2500 },
    businessDays: 3,
    closedWeekdays: sundays,
    holidays: ftcBusinessHolidays,
    source: '16 CFR Part 429 as first issued (from memory for the dates and the threshold)',
  },
  {
    id: 'us-ftc-429-2015',
    jurisdiction: 'US',
    title: 'FTC Cooling-Off Rule (16 CFR Part 429)',
    effectiveFrom: '2015-03-13',
    effectiveUntil: null,
    thresholdsCents: { home: 2500, elsewhere: 13000 },
    businessDays: 3,
    closedWeekdays: sundays,
    holidays: ftcBusinessHolidays,
    source:
      'Federal Register 80 FR 1329 (Jan 9 2015), 16 CFR Part 429 [S128]; business day per Mass. Division of Banks opinion 98-050 [S130]',
  },
  {
    id: 'us-ca-home-solicitation',
    jurisdiction: 'US-CA',
    title: 'California Home Solicitation Sales Act (Civil Code §1689.5 ff.)',
    // Start date from memory; the 5-business-day period for buyers aged 65 or older (from memory,
    // TRADE.md §8.2) is not applied: Seamwright does not ask for the buyer's age.
    effectiveFrom: '1971-01-01',
    effectiveUntil: null,
    thresholdsCents: { home: 2500, elsewhere: 2500 },
    businessDays: 3,
    closedWeekdays: sundays,
    holidays: ftcBusinessHolidays,
    source:
      'California DCA Legal Guide K-10 "Homeowner\'s rights to cancel" (Jan 2010) [S133]; holiday list and start date from memory',
  },
];
