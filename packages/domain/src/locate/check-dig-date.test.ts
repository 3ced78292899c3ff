import { describe, expect, it } from 'vitest';
import { checkDigDate } from './check-dig-date.js';
import { computeLocateTicket } from './locate-ticket.js';
import { effectiveLocateStatus } from './status.js';

const losAngeles = 'America/Los_Angeles';
// CA ticket called in Mon 2025-06-02 09:00 PDT: earliest dig Thu 2025-06-05 00:00, valid
// through Mon 2025-06-30 (Cal. Gov. Code §4216, TRADE.md checks 26 and 28).
const caTicket = computeLocateTicket({
  region: 'US-CA',
  timeZone: losAngeles,
  calledAt: '2025-06-02T16:00:00Z',
});

describe('checkDigDate', () => {
  it('refuses a start before the earliest lawful dig (Cal. Gov. Code §4216.2, 2 working days)', () => {
    const check = checkDigDate(caTicket, '2025-06-04T15:00:00Z'); // Wed 08:00 PDT
    expect(check).toMatchObject({ ok: false, reason: 'before-earliest-dig' });
    if (!check.ok) expect(check.message).toContain('Thu 2025-06-05 00:00');
  });

  it('accepts a start inside the window (Cal. Gov. Code §4216.2)', () => {
    expect(checkDigDate(caTicket, '2025-06-05T15:00:00Z')).toEqual({ ok: true });
  });

  it('refuses a start more than 14 calendar days after the notice', () => {
    // TRADE.md check 28, Cal. Gov. Code §4216.2 [S96]: start 2025-06-20, ticket 2025-06-02 →
    // too early; the earliest allowed call for that start is 2025-06-06.
    const check = checkDigDate(caTicket, '2025-06-20T15:00:00Z');
    expect(check).toMatchObject({ ok: false, reason: 'notice-too-early' });
    if (!check.ok) expect(check.message).toContain('on or after Fri 2025-06-06');
  });

  it('refuses a start after the ticket expired (TRADE.md check 26, 28-day ticket)', () => {
    const check = checkDigDate(caTicket, '2025-07-01T15:00:00Z');
    expect(check).toMatchObject({ ok: false, reason: 'ticket-expired' });
    if (!check.ok) expect(check.message).toContain('Tue 2025-07-01 00:00');
  });

  it('accepts any start after the earliest dig when the rule sets no lead limit (Fla. Stat. §556.105)', () => {
    const fl = computeLocateTicket({
      region: 'US-FL',
      timeZone: 'America/New_York',
      calledAt: '2025-06-02T14:00:00Z',
    });
    expect(fl.latestStartAt).toBeNull();
    expect(checkDigDate(fl, '2025-06-30T14:00:00Z')).toEqual({ ok: true });
  });
});

describe('effectiveLocateStatus', () => {
  it('shows expired once the life has passed, whatever was set', () => {
    expect(
      effectiveLocateStatus('clear', caTicket.expiresAt, new Date('2025-06-30T12:00:00Z')),
    ).toBe('clear');
    expect(
      effectiveLocateStatus('clear', caTicket.expiresAt, new Date('2025-07-01T07:00:00Z')),
    ).toBe('expired');
  });
});
