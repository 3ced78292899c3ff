import { describe, expect, it } from 'vitest';
import { ageReceivables, agingBucketFor } from './aging.js';
import { dueReminderStep, reminderScheduleProblem, reminderSteps } from './reminder-schedule.js';
import { waterSavedPerYear } from './water-savings.js';

describe('agingBucketFor', () => {
  // Bucket edges: the usual accounts-receivable aging columns (common practice, no published
  // source): not yet due, then 1–30, 31–60, 61–90 and over 90 days past due.
  it.each([
    [-5, 'current'],
    [0, 'current'],
    [1, 'days1to30'],
    [30, 'days1to30'],
    [31, 'days31to60'],
    [60, 'days31to60'],
    [61, 'days61to90'],
    [90, 'days61to90'],
    [91, 'over90'],
    [400, 'over90'],
  ] as const)('%i days past due is %s', (days, bucket) => {
    expect(agingBucketFor(days)).toBe(bucket);
  });
});

describe('ageReceivables', () => {
  it('groups balances by customer and bucket on a fixed day, across a leap day', () => {
    // Arithmetic on the calendar: 2028-02-01 → 2028-03-02 is 30 days (2028 is a leap year).
    const report = ageReceivables(
      [
        { customerId: 'a', customerName: 'Able', dueDate: '2028-03-10', balanceCents: 10_000 },
        { customerId: 'a', customerName: 'Able', dueDate: '2028-02-01', balanceCents: 2_500 },
        { customerId: 'b', customerName: 'Birch', dueDate: '2027-11-01', balanceCents: 7_000 },
        { customerId: 'b', customerName: 'Birch', dueDate: '2027-01-01', balanceCents: 0 },
      ],
      '2028-03-02',
    );
    expect(report.customers.map((c) => [c.name, c.totalCents])).toEqual([
      ['Able', 12_500],
      ['Birch', 7_000],
    ]);
    expect(report.customers[0]?.buckets).toEqual({
      current: 10_000,
      days1to30: 2_500,
      days31to60: 0,
      days61to90: 0,
      over90: 0,
    });
    // 2027-11-01 → 2028-03-02: 30 + 31 + 31 + 29 + 1 = 122 days past due.
    expect(report.buckets.over90).toBe(7_000);
    expect(report.totalCents).toBe(19_500);
  });
});

describe('reminders', () => {
  const offsets = [-3, 0, 7, 14, 30];

  it('places each step around the due date', () => {
    expect(reminderSteps(offsets, '2027-01-31').map((s) => s.dueOn)).toEqual([
      '2027-01-28',
      '2027-01-31',
      '2027-02-07',
      '2027-02-14',
      '2027-03-02',
    ]);
  });

  it('is due once per step, and only the latest of several missed steps', () => {
    const base = { offsets, dueDate: '2027-01-31', sentOn: '2027-01-15' };
    expect(dueReminderStep({ ...base, today: '2027-01-27', alreadySentOffsets: [] })).toBeNull();
    expect(
      dueReminderStep({ ...base, today: '2027-01-28', alreadySentOffsets: [] })?.offsetDays,
    ).toBe(-3);
    expect(dueReminderStep({ ...base, today: '2027-01-29', alreadySentOffsets: [-3] })).toBeNull();
    // A worker down from the 29th to 20 February: one message, the 14-day one.
    expect(
      dueReminderStep({ ...base, today: '2027-02-20', alreadySentOffsets: [-3] })?.offsetDays,
    ).toBe(14);
    expect(
      dueReminderStep({ ...base, today: '2027-02-21', alreadySentOffsets: [-3, 14] }),
    ).toBeNull();
  });

  it('skips steps before the invoice was sent', () => {
    const step = dueReminderStep({
      offsets,
      dueDate: '2027-01-31',
      sentOn: '2027-02-03',
      today: '2027-02-03',
      alreadySentOffsets: [],
    });
    expect(step).toBeNull();
  });

  it('names what is wrong with a schedule', () => {
    expect(reminderScheduleProblem([-3, 0, 7])).toBeNull();
    expect(reminderScheduleProblem([1.5])).toMatch(/whole number/);
    expect(reminderScheduleProblem([400])).toMatch(/more than a year/);
    expect(reminderScheduleProblem([7, 7])).toMatch(/different day/);
  });
});

describe('waterSavedPerYear', () => {
  it('matches the Southern Nevada check value', () => {
    // TRADE.md check 40: 1,000 sq ft of lawn removed in Southern Nevada saves 55,000 gal a year
    // (73 − 18 gal per sq ft per year; City of Las Vegas water-smart landscape figures).
    expect(waterSavedPerYear(1_000, 'US-NV')?.gallonsPerYear).toBe(55_000);
  });

  it('has no rule where no figure is published', () => {
    expect(waterSavedPerYear(1_000, 'US-FL')).toBeNull();
    expect(waterSavedPerYear(1_000, null)).toBeNull();
  });
});
