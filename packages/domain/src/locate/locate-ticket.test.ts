import { describe, expect, it } from 'vitest';
import { computeLocateTicket } from './locate-ticket.js';

const chicago = 'America/Chicago';
const newYork = 'America/New_York';
const losAngeles = 'America/Los_Angeles';

interface Row {
  name: string;
  /** Where the expected value comes from. */
  source: string;
  region: string;
  timeZone: string;
  calledAt: string;
  earliestDigAt: string;
  expiresAt?: string;
}

// Earliest dig and expiry per region. Instants are written in UTC; the comment on each row gives
// the local day and time the source states.
const rows: Row[] = [
  {
    name: 'TX, notice Fri 14:00 → Tue 14:00',
    source: 'TRADE.md check 20, Tex. Util. Code §251.151(a) (48 h excl. Sat/Sun)',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-06-06T19:00:00Z', // Fri 2025-06-06 14:00 CDT
    earliestDigAt: '2025-06-10T19:00:00.000Z', // Tue 2025-06-10 14:00 CDT
    // 14-day ticket life: TRADE.md §6, 16 TAC §18.3(f); valid through Fri 2025-06-20.
    expiresAt: '2025-06-21T05:00:00.000Z',
  },
  {
    name: 'TX, Saturday notice → Tuesday 11:59',
    source: 'TRADE.md check 21, Tex. Util. Code §251.151(b)',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-09-06T15:00:00Z', // Sat 2025-09-06 10:00 CDT
    earliestDigAt: '2025-09-09T16:59:00.000Z', // Tue 2025-09-09 11:59 CDT
  },
  {
    name: 'TX, Saturday notice before Labor Day → Wednesday 11:59',
    source: 'TRADE.md check 22, Tex. Util. Code §251.151(b) (Mon 2025-09-01 Labor Day)',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-08-30T14:00:00Z', // Sat 2025-08-30 09:00 CDT
    earliestDigAt: '2025-09-03T16:59:00.000Z', // Wed 2025-09-03 11:59 CDT
  },
  {
    name: 'TX, Friday before Labor Day: Sat, Sun and Mon not counted',
    source: 'derived from Tex. Util. Code §251.151(a); Labor Day from the date-holidays US-TX list',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-08-29T19:00:00Z', // Fri 2025-08-29 14:00 CDT: 10 h, then Tue 24 h, Wed 14 h
    earliestDigAt: '2025-09-03T19:00:00.000Z', // Wed 2025-09-03 14:00 CDT
  },
  {
    name: 'TX, day before Thanksgiving: Thu and the Friday after are Texas holidays',
    source:
      'derived from Tex. Util. Code §251.151(a); Thanksgiving and the day after from the date-holidays US-TX list (Tex. Gov. Code §662.003, from memory)',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-11-26T15:00:00Z', // Wed 2025-11-26 09:00 CST: 15 h, Mon 24 h, Tue 9 h
    earliestDigAt: '2025-12-02T15:00:00.000Z', // Tue 2025-12-02 09:00 CST
  },
  {
    name: 'TX, Sunday notice: the clock starts Monday 00:00',
    source: 'derived from Tex. Util. Code §251.151(a) (§251.151(b) speaks of Saturday only)',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-09-07T15:00:00Z', // Sun 2025-09-07 10:00 CDT
    earliestDigAt: '2025-09-10T05:00:00.000Z', // Wed 2025-09-10 00:00 CDT
  },
  {
    name: 'TX, over the end of summer time: counted in local clock hours',
    source: 'derived from Tex. Util. Code §251.151(a); clocks fall back Sun 2025-11-02',
    region: 'US-TX',
    timeZone: chicago,
    calledAt: '2025-10-31T19:00:00Z', // Fri 2025-10-31 14:00 CDT
    earliestDigAt: '2025-11-04T20:00:00.000Z', // Tue 2025-11-04 14:00 CST
  },
  {
    name: 'FL, Wednesday before Thanksgiving → Wednesday after',
    source: 'TRADE.md check 23, Fla. Stat. §556.102, §556.105 (Thanksgiving and the Friday after)',
    region: 'US-FL',
    timeZone: newYork,
    calledAt: '2025-11-26T15:00:00Z', // Wed 2025-11-26 10:00 EST
    earliestDigAt: '2025-12-03T05:00:00.000Z', // Wed 2025-12-03 00:00 EST
    // 30-day notice life: TRADE.md §6, Fla. Stat. §556.105; valid through Fri 2025-12-26.
    expiresAt: '2025-12-27T05:00:00.000Z',
  },
  {
    name: 'FL, Tuesday before Christmas Eve → Tuesday after',
    source: 'TRADE.md check 24, Fla. Stat. §556.102 (Christmas Eve and Christmas Day)',
    region: 'US-FL',
    timeZone: newYork,
    calledAt: '2025-12-23T14:00:00Z', // Tue 2025-12-23 09:00 EST
    earliestDigAt: '2025-12-30T05:00:00.000Z', // Tue 2025-12-30 00:00 EST
  },
  {
    name: 'FL, Veterans Day is a business day under the statute list',
    source:
      'Fla. Stat. §556.102 list (TRADE.md §6) has no Veterans Day, though the date-holidays US-FL list does',
    region: 'US-FL',
    timeZone: newYork,
    calledAt: '2025-11-07T15:00:00Z', // Fri 2025-11-07 10:00 EST → Mon 11-10, Tue 11-11
    earliestDigAt: '2025-11-12T05:00:00.000Z', // Wed 2025-11-12 00:00 EST
  },
  {
    name: 'FL, weekend holidays observed: Christmas Eve 2022 on Fri, Christmas on Mon',
    source: 'Fla. Stat. §556.102 weekend observance rule (TRADE.md §6; wording from memory)',
    region: 'US-FL',
    timeZone: newYork,
    calledAt: '2022-12-22T15:00:00Z', // Thu 2022-12-22 → Tue 12-27, Wed 12-28 count
    earliestDigAt: '2022-12-29T05:00:00.000Z', // Thu 2022-12-29 00:00 EST
  },
  {
    name: 'Default (IN has no rule), call Tuesday → dig Friday',
    source: 'TRADE.md check 25, Indiana counting example [S111] (2 full working days)',
    region: 'US-IN',
    timeZone: 'America/Indiana/Indianapolis',
    calledAt: '2025-06-03T14:00:00Z', // Tue 2025-06-03 10:00 EDT
    earliestDigAt: '2025-06-06T04:00:00.000Z', // Fri 2025-06-06 00:00 EDT
  },
  {
    name: 'CA, ticket issued 2025-06-02 is valid through 2025-06-30',
    source: 'TRADE.md check 26, Cal. Gov. Code §4216 (28 days) [S96] [S97]',
    region: 'US-CA',
    timeZone: losAngeles,
    calledAt: '2025-06-02T16:00:00Z', // Mon 2025-06-02 09:00 PDT → Tue, Wed count
    earliestDigAt: '2025-06-05T07:00:00.000Z', // Thu 2025-06-05 00:00 PDT
    expiresAt: '2025-07-01T07:00:00.000Z', // end of Mon 2025-06-30 PDT
  },
  {
    name: 'CA, César Chávez Day (Mon 2025-03-31) is not a working day',
    source:
      'Cal. Gov. Code §4216 working days skip state holidays; date from the date-holidays US-CA list',
    region: 'US-CA',
    timeZone: losAngeles,
    calledAt: '2025-03-28T17:00:00Z', // Fri 2025-03-28 10:00 PDT → Tue 04-01, Wed 04-02
    earliestDigAt: '2025-04-03T07:00:00.000Z', // Thu 2025-04-03 00:00 PDT
  },
  {
    name: 'GA, ticket created 2025-06-02 expires 2025-07-02; 3 business days',
    source: 'TRADE.md check 27, Georgia one-call guidance [S105] (30 days, 3 business days)',
    region: 'US-GA',
    timeZone: newYork,
    calledAt: '2025-06-02T14:00:00Z', // Mon 2025-06-02 10:00 EDT → Tue, Wed, Thu
    earliestDigAt: '2025-06-06T04:00:00.000Z', // Fri 2025-06-06 00:00 EDT
    expiresAt: '2025-07-03T04:00:00.000Z', // end of Wed 2025-07-02 EDT
  },
  {
    name: 'NY, Election Day 2025-11-04 is a New York public holiday',
    source:
      '16 NYCRR Part 753 [S103] (2 working days, call day not counted); Election Day from the date-holidays US-NY list (N.Y. Gen. Constr. Law §24, from memory)',
    region: 'US-NY',
    timeZone: newYork,
    calledAt: '2025-11-03T15:00:00Z', // Mon 2025-11-03 → Wed 11-05, Thu 11-06
    earliestDigAt: '2025-11-07T05:00:00.000Z', // Fri 2025-11-07 00:00 EST
  },
];

describe('computeLocateTicket', () => {
  it.each(rows)('$name ($source)', (row) => {
    const ticket = computeLocateTicket(row);
    expect(ticket.earliestDigAt).toBe(row.earliestDigAt);
    if (row.expiresAt) expect(ticket.expiresAt).toBe(row.expiresAt);
    expect(ticket.rule.region).toBe(row.region);
  });

  it('explains a Saturday notice in words (Tex. Util. Code §251.151(b), TRADE.md check 22)', () => {
    const ticket = computeLocateTicket({
      region: 'TX',
      timeZone: chicago,
      calledAt: '2025-08-30T14:00:00Z',
    });
    expect(ticket.rule).toMatchObject({ id: 'us-tx-251-151', region: 'US-TX', isDefault: false });
    expect(ticket.explanation).toContain('Notice Sat 2025-08-30 09:00');
    expect(ticket.explanation).toContain('Mon 2025-09-01 (Labor Day)');
    expect(ticket.explanation).toContain('earliest dig Wed 2025-09-03 11:59');
  });

  it('falls back to the default and says so when the region has no rule (Seamwright default)', () => {
    const ticket = computeLocateTicket({
      region: 'US-OR',
      timeZone: 'America/Los_Angeles',
      calledAt: '2025-06-03T17:00:00Z',
    });
    expect(ticket.rule).toMatchObject({
      isDefault: true,
      region: 'US-OR',
      lifeIsCompanyDefault: true,
    });
    expect(ticket.explanation).toMatch(/^No locate rule on file for US-OR/);
    // 2 full business days after Tue 2025-06-03 → Fri 2025-06-06 (TRADE.md check 25 counting).
    expect(ticket.earliestDigAt).toBe('2025-06-06T07:00:00.000Z');
  });

  it('judges a notice by the rule in force on its day (GA rule dated 1 July 2016, [S105])', () => {
    const before = computeLocateTicket({
      region: 'US-GA',
      timeZone: newYork,
      calledAt: '2016-06-30T14:00:00Z',
    });
    const after = computeLocateTicket({
      region: 'US-GA',
      timeZone: newYork,
      calledAt: '2016-07-01T14:00:00Z',
    });
    expect(before.rule.isDefault).toBe(true);
    expect(after.rule.id).toBe('us-ga-2016');
  });

  it("tries the company's own rule first (rule shape is plain data)", () => {
    const own = JSON.parse(
      JSON.stringify({
        id: 'company-or',
        region: 'US-OR',
        title: 'Our Oregon rule',
        effectiveFrom: '2020-01-01',
        effectiveUntil: null,
        closedWeekdays: [0, 6],
        holidays: { kind: 'dataset', country: 'US', state: 'OR', types: ['public'] },
        notice: { kind: 'full-days', days: 3 },
        maxAhead: null,
        life: { days: 45, unit: 'calendar', isCompanyDefault: true },
        source: 'company setting',
      }),
    );
    const ticket = computeLocateTicket({
      region: 'OR',
      timeZone: 'America/Los_Angeles',
      calledAt: '2025-06-02T17:00:00Z', // Mon → Tue, Wed, Thu (company setting: 3 days)
      companyRules: [own],
    });
    expect(ticket.rule).toMatchObject({ id: 'company-or', isDefault: false });
    expect(ticket.earliestDigAt).toBe('2025-06-06T07:00:00.000Z');
  });

  it('refuses an instant it cannot read', () => {
    expect(() =>
      computeLocateTicket({ region: 'US-TX', timeZone: chicago, calledAt: 'soon' }),
    ).toThrow(RangeError);
  });
});
