import { describe, expect, it } from 'vitest';
import type { CancellationInput } from './cancellation-period.js';
import { cancellationPeriod, withinCancellationPeriod } from './cancellation-period.js';

const denver = 'America/Denver';

/** A sale signed at 10:00 local time in Denver on `day`. */
function saleOn(day: string, overrides: Partial<CancellationInput> = {}): CancellationInput {
  return {
    signedAt: new Date(`${day}T10:00:00-06:00`),
    timeZone: denver,
    region: 'CO',
    place: 'home',
    priceCents: 850_000,
    ...overrides,
  };
}

function covered(input: CancellationInput) {
  const period = cancellationPeriod(input);
  if (!period.covered) throw new Error(`expected a covered sale, got ${period.reason}`);
  return period;
}

describe('cancellationPeriod: thresholds (TRADE.md check value 33)', () => {
  // 16 CFR Part 429 as amended by 80 FR 1329 (Jan 9 2015) [S128]: $25 at the buyer's home,
  // $130 at other temporary places.
  it.each([
    ['home', 2499, false],
    ['home', 2500, true],
    ['elsewhere', 12999, false],
    ['elsewhere', 13000, true],
  ] as const)('a sale %s for %i cents is covered: %s', (place, priceCents, expected) => {
    const period = cancellationPeriod(saleOn('2025-06-06', { place, priceCents }));
    expect(period.covered).toBe(expected);
    if (!period.covered) expect(period.reason).toBe('amount');
  });

  // Before the 2015 amendment the $25 threshold applied at every place away from the seller's
  // (from memory), so a $100 sale at a hotel in 2014 was covered.
  it('judges a sale by the rule in force on its day', () => {
    const period = covered(saleOn('2014-06-06', { place: 'elsewhere', priceCents: 10_000 }));
    expect(period.rule.id).toBe('us-ftc-429-1972');
    expect(
      cancellationPeriod(saleOn('2025-06-06', { place: 'elsewhere', priceCents: 10_000 })),
    ).toMatchObject({ covered: false, reason: 'amount' });
  });

  // 16 CFR §429.0: a sale at the seller's place of business, or made entirely by mail or phone
  // without a visit, is not a covered sale [S128].
  it.each(['office', 'remote'] as const)('a sale made %s is not covered', (place) => {
    expect(cancellationPeriod(saleOn('2025-06-06', { place }))).toMatchObject({
      covered: false,
      reason: 'place',
    });
  });

  it('has no rule for a region outside the US', () => {
    expect(cancellationPeriod(saleOn('2025-06-06', { region: 'ON' }))).toMatchObject({
      covered: false,
      reason: 'region',
    });
  });

  it('refuses a price that is not whole cents', () => {
    expect(() => cancellationPeriod(saleOn('2025-06-06', { priceCents: 25.5 }))).toThrow(
      RangeError,
    );
    expect(() => cancellationPeriod(saleOn('2025-06-06', { priceCents: -1 }))).toThrow(RangeError);
  });
});

describe('cancellationPeriod: the end of the period (TRADE.md check values 34–36)', () => {
  // 16 CFR Part 429 [S128]: until midnight of the 3rd business day after the sale; business day
  // = every day but Sunday and the listed holidays (Mass. Division of Banks opinion 98-050 [S130];
  // the holiday list from memory).
  it.each([
    // #34: signed Fri 2025-06-06 → Sat 06-07 (1), Mon 06-09 (2), Tue 06-10 (3)
    ['2025-06-06', ['2025-06-07', '2025-06-09', '2025-06-10'], '2025-06-11T06:00:00.000Z'],
    // #35: signed Thu 2025-07-03, Fri 07-04 Independence Day → Sat 07-05, Mon 07-07, Tue 07-08
    ['2025-07-03', ['2025-07-05', '2025-07-07', '2025-07-08'], '2025-07-09T06:00:00.000Z'],
    // #36: signed Sat 2025-10-11, Mon 10-13 Columbus Day → Tue 10-14, Wed 10-15, Thu 10-16
    ['2025-10-11', ['2025-10-14', '2025-10-15', '2025-10-16'], '2025-10-17T06:00:00.000Z'],
  ])('signed %s at home: business days %j, ends %s', (day, days, endsAt) => {
    const period = covered(saleOn(day));
    expect(period.saleDate).toBe(day);
    expect(period.businessDays).toEqual(days);
    expect(period.lastDay).toBe(days[2]);
    // Denver is UTC−6 in summer: local midnight after the last day is 06:00 UTC.
    expect(period.endsAt.toISOString()).toBe(endsAt);
  });

  // Derived from the same rule: a sale signed on a Sunday starts counting on Monday.
  it('counts from the day after a Sunday sale', () => {
    expect(covered(saleOn('2025-06-08')).businessDays).toEqual([
      '2025-06-09',
      '2025-06-10',
      '2025-06-11',
    ]);
  });

  // Derived: Thanksgiving (4th Thursday of November) and Christmas are not business days.
  it('skips Thanksgiving and Christmas', () => {
    expect(covered(saleOn('2025-11-26')).businessDays).toEqual([
      '2025-11-28',
      '2025-11-29',
      '2025-12-01',
    ]);
    expect(covered(saleOn('2025-12-23')).businessDays).toEqual([
      '2025-12-24',
      '2025-12-26',
      '2025-12-27',
    ]);
  });

  it('reads the day of the sale in the company’s time zone', () => {
    // 2025-06-07 03:00 UTC is still Friday 06-06 at 21:00 in Denver.
    const late = covered(saleOn('2025-06-06', { signedAt: new Date('2025-06-07T03:00:00Z') }));
    expect(late.saleDate).toBe('2025-06-06');
    expect(late.lastDay).toBe('2025-06-10');
    // The same instant is already Saturday 13:00 in Guam (UTC+10).
    const guam = covered(
      saleOn('2025-06-06', {
        signedAt: new Date('2025-06-07T03:00:00Z'),
        timeZone: 'Pacific/Guam',
        region: 'GU',
      }),
    );
    expect(guam.saleDate).toBe('2025-06-07');
    expect(guam.lastDay).toBe('2025-06-11');
    expect(guam.endsAt.toISOString()).toBe('2025-06-11T14:00:00.000Z');
  });

  it('ends at local midnight in winter time too', () => {
    // Signed Mon 2025-11-03 (after the change back to standard time, Denver UTC−7).
    const period = covered(saleOn('2025-11-03', { signedAt: new Date('2025-11-03T17:00:00Z') }));
    expect(period.lastDay).toBe('2025-11-06');
    expect(period.endsAt.toISOString()).toBe('2025-11-07T07:00:00.000Z');
  });

  it('applies the federal and the California rule together in California', () => {
    const period = covered(saleOn('2025-06-06', { region: 'CA', timeZone: 'America/Los_Angeles' }));
    expect(period.ruleIds).toEqual(['us-ftc-429-2015', 'us-ca-home-solicitation']);
    expect(period.lastDay).toBe('2025-06-10');
    expect(period.endsAt.toISOString()).toBe('2025-06-11T07:00:00.000Z');
  });
});

describe('withinCancellationPeriod', () => {
  const endsAt = new Date('2025-06-11T06:00:00.000Z');
  it.each([
    ['2025-06-11T05:59:59.999Z', true],
    ['2025-06-11T06:00:00.000Z', false],
    ['2025-06-12T00:00:00.000Z', false],
  ])('at %s: %s', (now, expected) => {
    expect(withinCancellationPeriod(endsAt, new Date(now))).toBe(expected);
  });

  it('is never within a period that does not exist', () => {
    expect(withinCancellationPeriod(null, new Date('2025-06-11T00:00:00Z'))).toBe(false);
  });
});
