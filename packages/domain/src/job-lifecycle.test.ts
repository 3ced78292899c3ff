import { describe, expect, it } from 'vitest';
import type { JobStatus } from './job-lifecycle.js';
import {
  allowedNextStatuses,
  assertTransition,
  canTransition,
  isJobStatus,
  jobStatuses,
  JobTransitionError,
} from './job-lifecycle.js';

// The lifecycle as DOMAIN.md states it, written out as a table.
const expected: Record<JobStatus, JobStatus[]> = {
  lead: ['estimated', 'lost', 'cancelled'],
  estimated: ['accepted', 'lost', 'cancelled'],
  accepted: ['scheduled', 'lost', 'cancelled'],
  scheduled: ['in_progress', 'lost', 'cancelled'],
  in_progress: ['installed', 'lost', 'cancelled'],
  installed: ['invoiced'],
  invoiced: ['paid'],
  paid: ['closed'],
  closed: [],
  lost: [],
  cancelled: [],
};

describe('job lifecycle', () => {
  it.each(jobStatuses.map((s) => [s, expected[s]] as const))(
    'from %s allows exactly %j',
    (from, next) => {
      expect(allowedNextStatuses(from)).toEqual(next);
    },
  );

  const pairs = jobStatuses.flatMap((from) => jobStatuses.map((to) => [from, to] as const));

  it.each(pairs)('%s → %s is allowed only when the table says so', (from, to) => {
    const legal = expected[from].includes(to);
    expect(canTransition(from, to)).toBe(legal);
    if (legal) expect(() => assertTransition(from, to)).not.toThrow();
    else expect(() => assertTransition(from, to)).toThrow(JobTransitionError);
  });

  it.each([
    ['lead', 'installed', /from lead to installed; allowed from lead: estimated, lost, cancelled/],
    ['installed', 'cancelled', /from installed to cancelled; allowed from installed: invoiced/],
    ['closed', 'lead', /from closed to lead; closed is final/],
    ['estimated', 'estimated', /from estimated to estimated/],
  ] as const)('refusing %s → %s says why', (from, to, message) => {
    expect(() => assertTransition(from, to)).toThrow(message);
  });

  it('carries the refused move and the allowed ones on the error', () => {
    try {
      assertTransition('scheduled', 'paid');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(JobTransitionError);
      expect(error).toMatchObject({
        from: 'scheduled',
        to: 'paid',
        allowed: ['in_progress', 'lost', 'cancelled'],
      });
    }
  });

  it.each([
    ['lead', true],
    ['in_progress', true],
    ['in progress', false],
    ['', false],
    [3, false],
  ] as const)('isJobStatus(%j) is %s', (value, result) => {
    expect(isJobStatus(value)).toBe(result);
  });
});
