import { describe, expect, it } from 'vitest';
import { formatQuantity, formatQuantityIn } from './format-quantity.js';

describe('formatQuantity', () => {
  it.each([
    [1, 'loads', '1 load'],
    [2, 'loads', '2 loads'],
    [1, 'days', '1 day'],
    [1, 'rolls', '1 roll'],
    [0, 'bags', '0 bags'],
    [1, 'cu yd', '1 cu yd'],
    [5.85, 'cu yd', '5.85 cu yd'],
    [151, 'ea', '151 ea'],
  ] as const)('%s %s reads "%s"', (quantity, unit, expected) => {
    expect(formatQuantity(quantity, unit)).toBe(expected);
  });
});

describe('formatQuantityIn', () => {
  // 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959), so 1 sq ft = 0.09290304 m².
  it.each([
    [600, 'sq ft', '55.74 m²'], // 600 × 0.09290304 = 55.74
    [66.67, 'sq yd', '55.74 m²'], // 66.67 × 9 × 0.09290304 = 55.74
    [100, 'lf', '30.48 m'],
    [5.85, 'cu yd', '5.85 cu yd'],
    [2, 'loads', '2 loads'],
  ] as const)('metric: %s %s reads "%s"', (quantity, unit, expected) => {
    expect(formatQuantityIn('metric', quantity, unit)).toBe(expected);
  });

  it('leaves imperial quantities as formatQuantity shows them', () => {
    expect(formatQuantityIn('imperial', 600, 'sq ft')).toBe('600 sq ft');
    expect(formatQuantityIn('imperial', 100, 'lf')).toBe('100 lf');
  });
});
