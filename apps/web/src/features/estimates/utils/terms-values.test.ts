import { describe, expect, it } from 'vitest';
import { sampleEstimate } from '../test/sample-estimate';
import { percentToBasisPoints, termsDefaults, termsPatchOf, termsSchema } from './terms-values';

describe('estimate terms', () => {
  it('reads a deposit percent exactly, in basis points', () => {
    expect(percentToBasisPoints('30')).toBe(3000);
    expect(percentToBasisPoints('12.5')).toBe(1250);
    expect(percentToBasisPoints('8.25')).toBe(825);
    expect(percentToBasisPoints('100')).toBe(10_000);
    expect(percentToBasisPoints('100.5')).toBeNull();
    expect(percentToBasisPoints('1.234')).toBeNull();
  });

  it('starts from the estimate and sends a fixed deposit in cents, notes trimmed or null', () => {
    const defaults = termsDefaults(sampleEstimate());
    expect(defaults).toMatchObject({
      validUntil: '2026-12-31',
      depositKind: 'percent',
      depositPercent: '30',
    });
    const values = termsSchema.parse({
      ...defaults,
      depositKind: 'amount',
      depositAmount: '500',
      notes: '  ',
      validUntil: '',
    });
    expect(termsPatchOf(values)).toEqual({
      validUntil: null,
      depositRule: { kind: 'amount', cents: 50_000 },
      notes: null,
    });
  });

  it('names the field at fault when the deposit cannot be read', () => {
    const result = termsSchema.safeParse({
      ...termsDefaults(sampleEstimate()),
      depositPercent: 'thirty',
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['depositPercent']);
  });
});
