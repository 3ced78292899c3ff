import { describe, expect, it } from 'vitest';
import { rollHandlingCautions, rollWeightLb } from './roll-weight.js';

describe('rollHandlingCautions', () => {
  it('warns for a full roll: 15 × 100 ft is at least 600 lb, over the 51 lb limit', () => {
    // 0.4 lb/sq ft: light end of turf weights (TRADE.md §1, [S15]); 51 lb: NIOSH via OSHA [S164]
    expect(rollWeightLb(15, 100)).toBe(600);
    const [caution] = rollHandlingCautions([
      { widthFt: 15, lengthFt: 100 },
      { widthFt: 15, lengthFt: 4 },
    ]);
    expect(caution?.key).toBe('heavy-rolls');
    expect(caution?.body).toContain('600 lb');
    expect(caution?.body).toContain('51 lb');
  });

  it('stays quiet for small offcuts under the limit and for no rolls', () => {
    // 2 × 6 ft × 0.4 = 4.8 lb
    expect(rollHandlingCautions([{ widthFt: 2, lengthFt: 6 }])).toEqual([]);
    expect(rollHandlingCautions([])).toEqual([]);
  });
});
