// When does a buyer's right to cancel a sale end? Pure: the caller passes the moment of signing,
// the company's time zone and region, where the sale was made and its price.
import { businessDaysAfter } from '../calendar/business-days.js';
import type { CalendarDate } from '../calendar/calendar.js';
import { addCalendarDays, localDateOf, startOfLocalDay } from '../calendar/calendar.js';
import { jurisdictionsOf } from './jurisdiction.js';
import type { CancellationRule, SalePlace } from './rules.js';
import { cancellationRules } from './rules.js';

export interface CancellationInput {
  signedAt: Date;
  /** The company's IANA time zone: days and midnight are counted there. */
  timeZone: string;
  /** The company's region code (see jurisdiction.ts). */
  region: string | null;
  place: SalePlace;
  /** The price the buyer agreed to, tax included. */
  priceCents: number;
}

export interface CoveredSale {
  covered: true;
  /** The rule whose period ends last (several may apply: federal and state). */
  rule: CancellationRule;
  /** Every rule that covers the sale. */
  ruleIds: string[];
  /** The day of the sale, in the company's time zone. */
  saleDate: CalendarDate;
  /** The business days of the period, in order; the right ends at midnight after the last. */
  businessDays: CalendarDate[];
  lastDay: CalendarDate;
  /** The instant the right ends: local midnight at the end of `lastDay`. */
  endsAt: Date;
}

export interface UncoveredSale {
  covered: false;
  reason: 'region' | 'place' | 'amount';
  /** In words, for the people in the office. */
  detail: string;
}

export type CancellationPeriod = CoveredSale | UncoveredSale;

function inForce(rule: CancellationRule, day: CalendarDate): boolean {
  return rule.effectiveFrom <= day && (rule.effectiveUntil === null || day <= rule.effectiveUntil);
}

function periodUnder(
  rule: CancellationRule,
  saleDate: CalendarDate,
  timeZone: string,
): CoveredSale {
  const businessDays = businessDaysAfter(saleDate, rule.businessDays, rule);
  const lastDay = businessDays[businessDays.length - 1] ?? saleDate;
  return {
    covered: true,
    rule,
    ruleIds: [rule.id],
    saleDate,
    businessDays,
    lastDay,
    endsAt: startOfLocalDay(addCalendarDays(lastDay, 1), timeZone),
  };
}

/**
 * The buyer's cancellation period for a sale, under every rule in force on the day of the sale
 * in the company's jurisdictions; the longest wins. `rules` defaults to the data in rules.ts.
 */
export function cancellationPeriod(
  input: CancellationInput,
  rules: readonly CancellationRule[] = cancellationRules,
): CancellationPeriod {
  if (!Number.isInteger(input.priceCents) || input.priceCents < 0)
    throw new RangeError('priceCents must be a whole number of cents ≥ 0');
  const jurisdictions = jurisdictionsOf(input.region);
  const saleDate = localDateOf(input.signedAt, input.timeZone);
  const inRegion = rules.filter(
    (rule) => jurisdictions.includes(rule.jurisdiction) && inForce(rule, saleDate),
  );
  if (inRegion.length === 0)
    return {
      covered: false,
      reason: 'region',
      detail: `No cancellation rule is on file for region ${input.region ?? '(none)'}`,
    };
  const atPlace = inRegion.filter((rule) => rule.thresholdsCents[input.place] !== undefined);
  if (atPlace.length === 0)
    return {
      covered: false,
      reason: 'place',
      detail:
        'Sales made at the seller’s place of business, or entirely by mail, phone or online, are not covered',
    };
  const covering = atPlace.filter(
    (rule) => input.priceCents >= (rule.thresholdsCents[input.place] ?? Infinity),
  );
  if (covering.length === 0)
    return {
      covered: false,
      reason: 'amount',
      detail: 'The price is below the smallest sale the cancellation rules cover',
    };
  const periods = covering.map((rule) => periodUnder(rule, saleDate, input.timeZone));
  const longest = periods.reduce((a, b) => (b.endsAt > a.endsAt ? b : a));
  return { ...longest, ruleIds: covering.map((rule) => rule.id) };
}

/** Whether the buyer may still cancel at `now` (the period ends exactly at `endsAt`). */
export function withinCancellationPeriod(endsAt: Date | null, now: Date): boolean {
  return endsAt !== null && now.getTime() < endsAt.getTime();
}
