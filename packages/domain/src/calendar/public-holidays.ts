// Public holidays from the `date-holidays` dataset (country and state lists), as a lookup the
// business-day counting can use. Only a statute that names its own list (Florida's one-call law)
// replaces it with rules of our own. The dataset's dates are local calendar days, and observed
// ("substitute") days are included, as a state office would be closed on them.
import Holidays from 'date-holidays';
import type { HolidayLookup } from './business-days.js';
import type { CalendarDate } from './calendar.js';

/** Which dataset list to use: country, optional state, and the holiday types that close days. */
export interface PublicHolidaySet {
  country: string;
  state?: string;
  /** date-holidays types; `public` is the days set by law. */
  types: readonly ('public' | 'bank' | 'school' | 'optional' | 'observance')[];
}

const byYearCache = new Map<string, Map<number, Map<CalendarDate, string>>>();
const datasetCache = new Map<string, Holidays>();

function keyOf(set: PublicHolidaySet): string {
  return `${set.country}|${set.state ?? ''}|${[...set.types].sort().join(',')}`;
}

function yearOf(set: PublicHolidaySet, year: number): Map<CalendarDate, string> {
  const key = keyOf(set);
  let years = byYearCache.get(key);
  if (!years) byYearCache.set(key, (years = new Map<number, Map<CalendarDate, string>>()));
  const cached = years.get(year);
  if (cached) return cached;
  const datasetKey = `${set.country}|${set.state ?? ''}`;
  let dataset = datasetCache.get(datasetKey);
  if (!dataset) {
    // Building the dataset parses its rules: once per country/state per process.
    dataset = set.state ? new Holidays(set.country, set.state) : new Holidays(set.country);
    datasetCache.set(datasetKey, dataset);
  }
  const days = new Map<CalendarDate, string>();
  for (const holiday of dataset.getHolidays(year)) {
    if (!set.types.includes(holiday.type)) continue;
    const date = holiday.date.slice(0, 10);
    if (!days.has(date)) days.set(date, holiday.name);
  }
  years.set(year, days);
  return days;
}

let probe: Holidays | undefined;

/** A lookup of the set's holidays by day; throws for a country or state the dataset lacks. */
export function publicHolidayLookup(set: PublicHolidaySet): HolidayLookup {
  probe ??= new Holidays();
  const states = probe.getStates(set.country);
  if (!probe.getCountries()[set.country] || (set.state && !states?.[set.state]))
    throw new RangeError(
      `No public-holiday data for ${set.country}${set.state ? `-${set.state}` : ''}`,
    );
  return (date) => yearOf(set, Number(date.slice(0, 4))).get(date) ?? null;
}
