import { describe, expect, it } from 'vitest';
import { formatDay, formatMoney, formatQuantity } from './plain-words';

// Plain formatting (common practice, no published source).
describe('customer page words', () => {
  it('says money in the estimate currency and a calendar day without shifting it', () => {
    expect(formatMoney(662000, 'USD')).toBe('$6,620.00');
    expect(formatDay('2027-01-02')).toBe('January 2, 2027');
  });

  it('says one day, not one days, and leaves other units alone', () => {
    expect(formatQuantity(1, 'days')).toBe('1 day');
    expect(formatQuantity(1, 'boxes')).toBe('1 box');
    expect(formatQuantity(2, 'days')).toBe('2 days');
    expect(formatQuantity(1, 'sq ft')).toBe('1 sq ft');
    expect(formatQuantity(1170.5, 'sq ft')).toBe('1,170.5 sq ft');
  });
});
