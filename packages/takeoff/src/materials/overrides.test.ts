import { describe, expect, it } from 'vitest';
import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import { computeTakeoff } from './compute-takeoff.js';
import { applyOverrides, unmatchedOverrides } from './overrides.js';
import { jobInput } from './test-support.js';

const lines = computeTakeoff(jobInput(), defaultTakeoffSettings);
const byKey = (key: string, list = lines) => list.find((l) => l.key === key);

describe('applyOverrides', () => {
  it('replaces the quantity and keeps the computed value and rule visible', () => {
    const result = applyOverrides(lines, [
      { key: 'base-stone-tons', quantity: 20, note: 'supplier minimum' },
    ]);
    const before = byKey('base-stone-tons');
    const after = byKey('base-stone-tons', result);
    expect(after?.quantity).toBe(20);
    expect(after?.override).toEqual({
      quantity: 20,
      computedQuantity: before?.quantity,
      note: 'supplier minimum',
    });
    expect(after?.rule).toBe(before?.rule);
    expect(after?.rawQuantity).toBe(before?.rawQuantity);
    expect(byKey('turf', result)).toBe(byKey('turf'));
  });

  it('keeps the first computed value when overridden twice', () => {
    const once = applyOverrides(lines, [{ key: 'perimeter-nails', quantity: 500 }]);
    const twice = applyOverrides(once, [{ key: 'perimeter-nails', quantity: 600 }]);
    expect(byKey('perimeter-nails', twice)?.override).toEqual({
      quantity: 600,
      computedQuantity: 480,
    });
  });

  it('does not change the input lines', () => {
    applyOverrides(lines, [{ key: 'turf', quantity: 1 }]);
    expect(byKey('turf')?.quantity).toBe(1050);
  });

  it('refuses negative quantities and reports keys that match no line', () => {
    expect(() => applyOverrides(lines, [{ key: 'turf', quantity: -1 }])).toThrow(RangeError);
    const overrides = [
      { key: 'turf', quantity: 1 },
      { key: 'gone', quantity: 2 },
    ];
    expect(unmatchedOverrides(lines, overrides)).toEqual([{ key: 'gone', quantity: 2 }]);
  });
});
