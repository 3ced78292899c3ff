import { describe, expect, it } from 'vitest';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';
import { unitsFor } from '../../../lib/units';
import { feetInWords, inCompanyUnits } from './feet-words';

const imperial = unitsFor('imperial');

describe('feetInWords', () => {
  it('rewrites the API’s feet in the company’s units', () => {
    expect(feetInWords('order 20 ft of 15 ft wide', imperial)).toBe(`order 20' 0" of 15' 0" wide`);
    expect(feetInWords('Jobs hold 12.5 ft of this roll', imperial)).toBe(
      `Jobs hold 12' 6" of this roll`,
    );
    expect(feetInWords('at most 1,000 ft', imperial)).toBe(`at most 1,000' 0"`);
    // 6.096 m is 20 ft exactly (1 ft = 0.3048 m, by definition).
    expect(feetInWords('order 20 ft', unitsFor('metric'))).toMatch(/^order 6\.1\d? m$/);
  });

  it('leaves other words and numbers alone', () => {
    expect(feetInWords('lot 4471 has 3 rolls; softer turf', imperial)).toBe(
      'lot 4471 has 3 rolls; softer turf',
    );
  });

  it('rewrites an ApiError’s detail and field messages', () => {
    const error = new ApiError({
      status: 409,
      code: ErrorCode.Conflict,
      title: 'Conflict',
      detail: 'Jobs hold 20 ft of this roll',
      errors: [{ path: 'remainingFt', message: 'Jobs hold 20 ft of this roll' }],
    });
    const shown = inCompanyUnits(error, imperial) as ApiError;
    expect(shown).toBeInstanceOf(ApiError);
    expect(shown.status).toBe(409);
    expect(shown.detail).toBe(`Jobs hold 20' 0" of this roll`);
    expect(shown.fieldMessage('remainingFt')).toBe(`Jobs hold 20' 0" of this roll`);
  });
});
