// The aging SQL caps days past due to [0, agingDaysCap]; that is only exact while every bucket
// edge lies inside the span (buckets: common practice, no published source).
import { agingBucketFor } from '@seamwright/domain';
import { describe, expect, it } from 'vitest';
import { agingDaysCap } from './receivables.repository.js';

describe('aging day cap', () => {
  it('never moves an invoice to another bucket', () => {
    expect(agingBucketFor(0)).toBe(agingBucketFor(-400));
    expect(agingBucketFor(agingDaysCap)).toBe('over90');
    expect(agingBucketFor(agingDaysCap - 1)).toBe('days61to90');
    for (let days = agingDaysCap; days < 2000; days += 1)
      expect(agingBucketFor(days)).toBe(agingBucketFor(agingDaysCap));
  });
});
