// The booking rules (our own scheduling policy, see booking-rules.ts; the dig window itself is
// checkDigDate's, TRADE.md §6). Dates are invented; 2026-03-02 is a Monday.
import { describe, expect, it } from 'vitest';
import { dayCount, daysOf } from './booking-days.js';
import { evaluateBooking } from './booking-rules.js';
import type { BookingFacts, BookingTicket } from './booking-rules.js';

const timeZone = 'America/Chicago';
// Chicago is UTC−6 in early March (summer time starts 2026-03-08).
const clearTicket: BookingTicket = {
  status: 'clear',
  earliestDigAt: '2026-03-04T17:59:00.000Z', // Wed 11:59 local
  expiresAt: '2026-03-20T05:59:00.000Z', // Fri 2026-03-20 00:59 local (CDT, UTC−5)
  latestStartAt: null,
  timeZone,
};

function facts(overrides: Partial<BookingFacts> = {}): BookingFacts {
  return {
    startDate: '2026-03-05',
    endDate: '2026-03-06',
    phase: 'tear_out_base',
    jobId: 'job-1',
    jobStatus: 'accepted',
    crew: { name: 'North crew', workingDays: [1, 2, 3, 4, 5], jobsPerDay: 1 },
    otherBookings: [],
    tickets: [clearTicket],
    cancellationEndsAt: null,
    turf: { reserved: true, shortFt: 0 },
    timeZone,
    now: new Date('2026-03-02T15:00:00Z'),
    ...overrides,
  };
}

const codes = (list: { code: string }[]) => list.map((i) => i.code);

describe('booking days', () => {
  it('counts inclusive days across a month end', () => {
    expect(dayCount({ startDate: '2026-02-27', endDate: '2026-03-02' })).toBe(4);
    expect(daysOf({ startDate: '2026-02-27', endDate: '2026-03-02' })).toEqual([
      '2026-02-27',
      '2026-02-28',
      '2026-03-01',
      '2026-03-02',
    ]);
  });
});

describe('evaluateBooking', () => {
  it('passes a clean booking with no issues', () => {
    expect(evaluateBooking(facts())).toEqual({ refusals: [], warnings: [] });
  });

  it('refuses a last day before the first, and a booking over 60 days', () => {
    expect(codes(evaluateBooking(facts({ endDate: '2026-03-04' })).refusals)).toEqual([
      'invalid-range',
    ]);
    expect(codes(evaluateBooking(facts({ endDate: '2026-05-30' })).refusals)).toEqual([
      'invalid-range',
    ]);
  });

  it('refuses a second job on a one-job day, naming the full day; the same job twice counts once', () => {
    const other = { jobId: 'job-2', startDate: '2026-03-06', endDate: '2026-03-09' };
    const result = evaluateBooking(facts({ otherBookings: [other] }));
    expect(result.refusals).toEqual([
      expect.objectContaining({
        code: 'over-capacity',
        message: expect.stringContaining('Fri 2026-03-06'),
      }),
    ]);
    const sameJob = { ...other, jobId: 'job-1' };
    expect(evaluateBooking(facts({ otherBookings: [sameJob] })).refusals).toEqual([]);
    const twoAday = { name: 'North crew', workingDays: [1, 2, 3, 4, 5], jobsPerDay: 2 };
    expect(evaluateBooking(facts({ otherBookings: [other], crew: twoAday })).refusals).toEqual([]);
  });

  it('warns about a Saturday for a Monday–Friday crew', () => {
    const result = evaluateBooking(facts({ endDate: '2026-03-07' }));
    expect(result.refusals).toEqual([]);
    expect(result.warnings).toEqual([
      expect.objectContaining({
        code: 'not-a-working-day',
        message: expect.stringContaining('Sat 2026-03-07'),
      }),
    ]);
  });

  it('refuses digging before the earliest dig day with the reason from checkDigDate', () => {
    const result = evaluateBooking(facts({ startDate: '2026-03-03', endDate: '2026-03-03' }));
    expect(result.refusals).toEqual([
      expect.objectContaining({
        code: 'before-earliest-dig',
        path: 'startDate',
        message: expect.stringContaining('Wed 2026-03-04 11:59'),
      }),
    ]);
  });

  it('only warns when digging is booked on the earliest day itself, which opens at 11:59', () => {
    const result = evaluateBooking(facts({ startDate: '2026-03-04', endDate: '2026-03-04' }));
    expect(result.refusals).toEqual([]);
    expect(codes(result.warnings)).toEqual(['dig-opens-later-that-day']);
  });

  it('does not check the dig window for turf or finishing', () => {
    const early = { startDate: '2026-03-03', endDate: '2026-03-03' };
    expect(evaluateBooking(facts({ ...early, phase: 'finishing' })).refusals).toEqual([]);
    expect(
      evaluateBooking(facts({ ...early, phase: 'turf_seams_infill', tickets: [] })).refusals,
    ).toEqual([]);
  });

  it('refuses digging with no ticket, with only a conflicting ticket, and after expiry', () => {
    expect(codes(evaluateBooking(facts({ tickets: [] })).refusals)).toEqual(['no-locate-ticket']);
    const conflict = { ...clearTicket, status: 'conflict' as const };
    expect(codes(evaluateBooking(facts({ tickets: [conflict] })).refusals)).toEqual([
      'locate-conflict',
    ]);
    const late = { startDate: '2026-03-23', endDate: '2026-03-23' };
    expect(codes(evaluateBooking(facts(late)).refusals)).toEqual(['ticket-expired']);
  });

  it('takes any usable ticket: a newer ticket lets a late start through', () => {
    const newer = {
      ...clearTicket,
      earliestDigAt: '2026-03-18T16:59:00Z',
      expiresAt: '2026-04-10T04:59:00Z',
    };
    const late = { startDate: '2026-03-23', endDate: '2026-03-23' };
    expect(evaluateBooking(facts({ ...late, tickets: [newer, clearTicket] })).refusals).toEqual([]);
  });

  it('warns when the ticket is not clear yet and when it expires before the booking ends', () => {
    const requested = { ...clearTicket, status: 'requested' as const };
    const everyDay = { name: 'North crew', workingDays: [0, 1, 2, 3, 4, 5, 6], jobsPerDay: 1 };
    // The ticket ends 00:59 local on Fri 2026-03-20, during the booking's last day.
    const result = evaluateBooking(
      facts({ tickets: [requested], endDate: '2026-03-20', crew: everyDay }),
    );
    expect(result.refusals).toEqual([]);
    expect(codes(result.warnings)).toEqual(['locate-not-clear', 'ticket-expires-during-booking']);
  });

  it('refuses work that starts before the cancellation period ends, in the company zone', () => {
    // The period ends at local midnight starting Fri 2026-03-06 (06:00 UTC).
    const cancellationEndsAt = new Date('2026-03-06T06:00:00Z');
    const inside = evaluateBooking(facts({ phase: 'finishing', cancellationEndsAt }));
    expect(inside.refusals).toEqual([
      expect.objectContaining({
        code: 'cancellation-period',
        message: expect.stringContaining('Thu 2026-03-05'),
      }),
    ]);
    const after = { startDate: '2026-03-06', endDate: '2026-03-06', phase: 'finishing' as const };
    expect(evaluateBooking(facts({ ...after, cancellationEndsAt })).refusals).toEqual([]);
  });

  it('warns when turf is laid before it is reserved or while some is still to order', () => {
    const turf = { phase: 'turf_seams_infill' as const };
    expect(
      codes(evaluateBooking(facts({ ...turf, turf: { reserved: false, shortFt: 0 } })).warnings),
    ).toEqual(['turf-not-reserved']);
    const short = evaluateBooking(facts({ ...turf, turf: { reserved: true, shortFt: 12.5 } }));
    expect(short.warnings).toEqual([
      expect.objectContaining({ code: 'turf-short', message: expect.stringContaining('13 ft') }),
    ]);
    expect(evaluateBooking(facts({ ...turf, turf: null })).warnings).toEqual([]);
  });

  it('refuses jobs before acceptance and after installing', () => {
    expect(codes(evaluateBooking(facts({ jobStatus: 'estimated' })).refusals)).toEqual([
      'job-not-bookable',
    ]);
    expect(codes(evaluateBooking(facts({ jobStatus: 'installed' })).refusals)).toEqual([
      'job-not-bookable',
    ]);
    expect(evaluateBooking(facts({ jobStatus: 'scheduled' })).refusals).toEqual([]);
  });
});
