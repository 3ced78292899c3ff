import { describe, expect, it } from 'vitest';
import { centsInputValue, formatCents, parseCents } from './money';

describe('money in cents', () => {
  it('reads typed money exactly, to the cent', () => {
    expect(parseCents('2.76')).toBe(276);
    expect(parseCents('$1,250')).toBe(125_000);
    expect(parseCents('0.5')).toBe(50);
    // 0.1 + 0.2 style float trouble never arises: digits are read as text.
    expect(parseCents('19.99')).toBe(1999);
    expect(parseCents('1.234')).toBeNull();
    expect(parseCents('-3')).toBeNull();
    expect(parseCents('')).toBeNull();
  });

  it('shows cents as money and as an input value', () => {
    expect(formatCents(160_751, 'USD')).toBe('$1,607.51');
    expect(formatCents(5, 'USD')).toBe('$0.05');
    expect(centsInputValue(4500)).toBe('45.00');
    expect(centsInputValue(7)).toBe('0.07');
  });
});
