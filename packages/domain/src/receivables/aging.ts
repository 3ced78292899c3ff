// Receivables aging: what each customer owes, grouped by how long it has been past due. The
// buckets are the ones accountants read (current, 1–30, 31–60, 61–90, over 90 days past the
// due date), counted in calendar days in the company's time zone.
import { calendarDaysBetween } from '../calendar/calendar.js';
import type { CalendarDate } from '../calendar/calendar.js';

export const agingBucketNames = [
  'current',
  'days1to30',
  'days31to60',
  'days61to90',
  'over90',
] as const;
export type AgingBucketName = (typeof agingBucketNames)[number];
export type AgingBuckets = Record<AgingBucketName, number>;

/** One open invoice as the report needs it: who owes, when it was due, what is still owed. */
export interface OpenBalance {
  customerId: string;
  customerName: string;
  dueDate: CalendarDate;
  balanceCents: number;
}

export interface CustomerAging {
  customerId: string;
  name: string;
  buckets: AgingBuckets;
  totalCents: number;
}

export interface AgingReport {
  asOf: CalendarDate;
  buckets: AgingBuckets;
  totalCents: number;
  customers: CustomerAging[];
}

/** The bucket for an invoice `daysPastDue` days after its due date (0 or less: not yet late). */
export function agingBucketFor(daysPastDue: number): AgingBucketName {
  if (daysPastDue <= 0) return 'current';
  if (daysPastDue <= 30) return 'days1to30';
  if (daysPastDue <= 60) return 'days31to60';
  if (daysPastDue <= 90) return 'days61to90';
  return 'over90';
}

export function emptyAgingBuckets(): AgingBuckets {
  return { current: 0, days1to30: 0, days31to60: 0, days61to90: 0, over90: 0 };
}

/**
 * Ages `balances` as of `asOf`. Balances of zero or less (paid, over-credited) are left out, so
 * a customer appears only while they owe something; customers are sorted by what they owe, the
 * largest first, then by name.
 */
export function ageReceivables(balances: readonly OpenBalance[], asOf: CalendarDate): AgingReport {
  const total = emptyAgingBuckets();
  const byCustomer = new Map<string, CustomerAging>();
  for (const balance of balances) {
    if (balance.balanceCents <= 0) continue;
    const bucket = agingBucketFor(calendarDaysBetween(balance.dueDate, asOf));
    let customer = byCustomer.get(balance.customerId);
    if (!customer) {
      customer = {
        customerId: balance.customerId,
        name: balance.customerName,
        buckets: emptyAgingBuckets(),
        totalCents: 0,
      };
      byCustomer.set(balance.customerId, customer);
    }
    customer.buckets[bucket] += balance.balanceCents;
    customer.totalCents += balance.balanceCents;
    total[bucket] += balance.balanceCents;
  }
  const customers = [...byCustomer.values()].sort(
    (a, b) => b.totalCents - a.totalCents || a.name.localeCompare(b.name),
  );
  const totalCents = agingBucketNames.reduce((sum, name) => sum + total[name], 0);
  return { asOf, buckets: total, totalCents, customers };
}
