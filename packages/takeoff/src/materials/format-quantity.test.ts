import { describe, expect, it } from 'vitest';
import { formatQuantity } from './format-quantity.js';

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
