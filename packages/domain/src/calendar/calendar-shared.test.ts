import { describe, expect, it } from 'vitest';
import { holidayDate, holidayNameOf } from './holidays.js';
import type { HolidayRule } from './holidays.js';
import { localInstantAt } from './calendar.js';
import { publicHolidayLookup } from './public-holidays.js';

const fridayAfterThanksgiving: HolidayRule = {
  name: 'Friday after Thanksgiving',
  kind: 'weekday',
  month: 11,
  weekday: 4,
  nth: 4,
  offsetDays: 1,
};
const christmas: HolidayRule = { name: 'Christmas Day', kind: 'fixed', month: 12, day: 25 };

describe('holiday rules', () => {
  it('moves a weekday rule by offsetDays (Fla. Stat. §556.102: Thanksgiving and the Friday after)', () => {
    // Thanksgiving 2025 is Thu 11-27 (4th Thursday, 5 U.S.C. 6103).
    expect(holidayDate(fridayAfterThanksgiving, 2025)).toBe('2025-11-28');
  });

  it('observes a Sunday holiday on Monday and a Saturday one on Friday only when asked', () => {
    // Christmas 2022 fell on a Sunday (day names verified in any calendar).
    expect(holidayNameOf('2022-12-26', [christmas])).toBeNull();
    expect(holidayNameOf('2022-12-26', [christmas], true)).toBe('Christmas Day (observed)');
    // Christmas 2021 fell on a Saturday: observed Friday 2021-12-24.
    expect(holidayNameOf('2021-12-24', [christmas], true)).toBe('Christmas Day (observed)');
  });
});

describe('publicHolidayLookup (date-holidays dataset)', () => {
  it('names US federal holidays by day (5 U.S.C. 6103: Labor Day, first Monday of September)', () => {
    const lookup = publicHolidayLookup({ country: 'US', types: ['public'] });
    expect(lookup('2025-09-01')).toBe('Labor Day');
    expect(lookup('2025-09-02')).toBeNull();
  });

  it('refuses a state the dataset does not know', () => {
    expect(() => publicHolidayLookup({ country: 'US', state: 'XX', types: ['public'] })).toThrow(
      /No public-holiday data for US-XX/,
    );
  });
});

describe('localInstantAt', () => {
  it('turns a local wall time into an instant, and 24:00 into the next midnight', () => {
    expect(localInstantAt('2025-09-09', 11 * 60 + 59, 'America/Chicago').toISOString()).toBe(
      '2025-09-09T16:59:00.000Z',
    );
    expect(localInstantAt('2025-06-30', 1440, 'America/Los_Angeles').toISOString()).toBe(
      '2025-07-01T07:00:00.000Z',
    );
  });
});
