import { describe, expect, it } from 'vitest';
import { describeActivity } from './activity-words';

describe('job activity in words', () => {
  it.each([
    [{ action: 'job.created', data: {} }, 'Started the job as a lead'],
    [
      { action: 'job.status_changed', data: { from: 'lead', to: 'estimated' } },
      'Moved from lead to estimated',
    ],
    [{ action: 'job.area_added', data: { name: 'Back yard' } }, 'Drew the area “Back yard”'],
    [
      { action: 'job.turf_reserved', data: { dyeLots: ['PT-3390'], shortFt: 0 } },
      'Reserved the turf from dye lot PT-3390',
    ],
    [
      { action: 'job.turf_reserved', data: { dyeLots: ['A'], shortFt: 20 } },
      'Reserved the turf from dye lot A, some to order',
    ],
    [
      { action: 'job.remnants_returned', data: { rollIds: ['x', 'y'] } },
      'Returned 2 remnants to stock',
    ],
    [{ action: 'job.estimate_sent', data: { version: 2 } }, 'Sent the estimate (version 2)'],
    [{ action: 'job.estimate_accepted', data: null }, 'Estimate accepted'],
    // A status that is not one of the lifecycle's falls back to the action's words.
    [{ action: 'job.status_changed', data: { from: 'x', to: 'y' } }, 'Status changed'],
  ])('%j → %s', (event, words) => {
    expect(describeActivity(event)).toBe(words);
  });
});
