import { describe, expect, it } from 'vitest';
import { businessDaysAfter, isBusinessDay } from '../calendar/business-days.js';
import { holidayDate } from '../calendar/holidays.js';
import { jurisdictionsOf } from './jurisdiction.js';
import { cancellationRules, ftcBusinessHolidays } from './rules.js';

describe('the FTC business holidays', () => {
  // The list in 16 CFR §429.0 as TRADE.md §8.2 recalls it (from memory); 2025 dates checked
  // against a calendar.
  it('fall on their 2025 dates', () => {
    expect(ftcBusinessHolidays.map((rule) => holidayDate(rule, 2025))).toEqual([
      '2025-01-01',
      '2025-02-17',
      '2025-05-26',
      '2025-07-04',
      '2025-09-01',
      '2025-10-13',
      '2025-11-11',
      '2025-11-27',
      '2025-12-25',
    ]);
  });

  it('counts Saturdays and Martin Luther King Jr. Day as business days, Sundays not', () => {
    const calendar = { closedWeekdays: [0], holidays: ftcBusinessHolidays };
    expect(isBusinessDay('2025-06-07', calendar)).toBe(true);
    expect(isBusinessDay('2025-06-08', calendar)).toBe(false);
    expect(isBusinessDay('2025-01-20', calendar)).toBe(true);
    expect(isBusinessDay('2025-07-04', calendar)).toBe(false);
  });

  it('refuses a count that is not a whole number of days', () => {
    const calendar = { closedWeekdays: [0], holidays: [] };
    expect(() => businessDaysAfter('2025-06-06', 0, calendar)).toThrow(RangeError);
    expect(() => businessDaysAfter('2025-06-06', 1.5, calendar)).toThrow(RangeError);
  });
});

describe('the cancellation rules data', () => {
  it('gives each jurisdiction at most one rule on any day', () => {
    const jurisdictions = new Set(cancellationRules.map((rule) => rule.jurisdiction));
    for (const jurisdiction of jurisdictions) {
      const rules = cancellationRules.filter((rule) => rule.jurisdiction === jurisdiction);
      const sorted = [...rules].sort((a, b) => a.effectiveFrom.localeCompare(b.effectiveFrom));
      for (let i = 1; i < sorted.length; i++) {
        const before = sorted[i - 1];
        expect(before?.effectiveUntil).not.toBeNull();
        expect((before?.effectiveUntil ?? '') < (sorted[i]?.effectiveFrom ?? '')).toBe(true);
      }
    }
  });

  it('names a source for every rule', () => {
    for (const rule of cancellationRules) expect(rule.source.length).toBeGreaterThan(10);
  });
});

describe('jurisdictionsOf', () => {
  it.each([
    ['CA', ['US', 'US-CA']],
    ['us-ca', ['US', 'US-CA']],
    [' co ', ['US', 'US-CO']],
    ['US', ['US']],
    [null, ['US']],
    ['', ['US']],
    ['ON', []],
    ['XX', []],
  ] as const)('%j → %j', (region, expected) => {
    expect(jurisdictionsOf(region)).toEqual(expected);
  });
});
