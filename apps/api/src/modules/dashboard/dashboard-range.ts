// The dashboard's period: calendar days in the company's time zone, both ends included, and
// the instants that bound them for timestamp columns.
import { addCalendarDays, localDateOf, startOfLocalDay } from '@seamwright/domain';

export interface DashboardRange {
  from: string;
  to: string;
  /** Start of `from` in the company's zone. */
  fromInstant: Date;
  /** Start of the day after `to` (exclusive end). */
  toInstant: Date;
  /** Today in the company's zone (estimates past their validity are expired on it). */
  today: string;
}

/** Default: the 12 calendar months up to and including today's. */
export function dashboardRange(
  timeZone: string,
  query: { from?: string | undefined; to?: string | undefined },
  now = new Date(),
): DashboardRange {
  const today = localDateOf(now, timeZone);
  const to = query.to ?? today;
  const year = Number(to.slice(0, 4));
  const month = Number(to.slice(5, 7));
  const start =
    month === 12 ? `${year}-01-01` : `${year - 1}-${String(month + 1).padStart(2, '0')}-01`;
  const from = query.from ?? start;
  return {
    from,
    to,
    fromInstant: startOfLocalDay(from, timeZone),
    toInstant: startOfLocalDay(addCalendarDays(to, 1), timeZone),
    today,
  };
}
