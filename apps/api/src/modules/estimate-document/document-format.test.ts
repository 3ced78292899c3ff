import { describe, expect, it } from 'vitest';
import { formatDocumentDate, formatMoney } from './document-format.js';

describe('formatMoney', () => {
  it('formats whole cents as dollars', () => {
    expect(formatMoney(123456, 'USD')).toBe('$1,234.56');
    expect(formatMoney(5, 'USD')).toBe('$0.05');
    expect(formatMoney(0, 'USD')).toBe('$0.00');
    expect(formatMoney(-1999, 'USD')).toBe('-$19.99');
  });

  it('never goes through a float, so the largest safe amounts print exactly', () => {
    // 2^53 − 1 cents; as a float, 90071992547409.91 would print ...409.91 → ...409.92 or so.
    expect(formatMoney(Number.MAX_SAFE_INTEGER, 'USD')).toBe('$90,071,992,547,409.91');
  });

  it('treats the amount as minor units of currencies without cents', () => {
    expect(formatMoney(1234, 'JPY')).toBe('¥1,234');
  });

  it('refuses fractions of a cent', () => {
    expect(() => formatMoney(10.5, 'USD')).toThrow(RangeError);
  });
});

describe('formatDocumentDate', () => {
  it('prints a calendar day without shifting it by a time zone', () => {
    expect(formatDocumentDate('2027-01-01')).toBe('January 1, 2027');
    expect(formatDocumentDate('2027-12-31')).toBe('December 31, 2027');
  });

  it('refuses anything but YYYY-MM-DD', () => {
    expect(() => formatDocumentDate('2027-1-1')).toThrow(RangeError);
  });
});
