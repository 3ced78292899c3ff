import { describe, expect, it } from 'vitest';
import {
  areaFormDefaults,
  areaFormSchema,
  areaSettingsOf,
  grainInputOf,
  type AreaFormValues,
} from './area-form-values';

const values = (extra: Partial<AreaFormValues> = {}): AreaFormValues => ({
  ...areaFormDefaults(null, { id: 'p1', rollWidthsFt: [15, 12] }),
  name: 'Back lawn',
  ...extra,
});

const grain = (extra: Partial<AreaFormValues['grain']>): AreaFormValues['grain'] => ({
  ...values().grain,
  ...extra,
});

describe('area form values', () => {
  it('starts a new area as landscape on the first product’s first width, cheapest grain', () => {
    expect(areaFormDefaults(null, { id: 'p1', rollWidthsFt: [12, 15] })).toMatchObject({
      usage: 'landscape',
      turfProductId: 'p1',
      roll: { widthFt: '12' },
      baseDepthFt: null,
      grain: { kind: 'cheapest' },
    });
    // Without a product, the most common width (TRADE.md §1: 15 ft).
    expect(areaFormDefaults(null, null).roll.widthFt).toBe('15');
  });

  it('turns the three grain choices into the API’s grain', () => {
    expect(grainInputOf(grain({ kind: 'cheapest', angleDeg: '45' }))).toBe('cheapest');
    expect(grainInputOf(grain({ kind: 'angle', angleDeg: ' 90° ' }))).toEqual({ angleDeg: 90 });
    expect(grainInputOf(grain({ kind: 'facing', facing: 'S', toward: 'street' }))).toEqual({
      facing: 'S',
      toward: 'street',
    });
    expect(grainInputOf(grain({ kind: 'facing', facing: 'E', toleranceDeg: '15' }))).toEqual({
      facing: 'E',
      toleranceDeg: 15,
    });
  });

  it('reads the settings for the API: inches of base, no product as null', () => {
    // 0.25 ft = 3 in (arithmetic).
    expect(areaSettingsOf(values({ baseDepthFt: 0.25, turfProductId: '' }))).toEqual({
      name: 'Back lawn',
      usage: 'landscape',
      turfProductId: null,
      roll: { widthFt: 15 },
      baseDepthIn: 3,
      grain: 'cheapest',
    });
  });

  it('refuses a missing direction or a tolerance out of range, on the field', () => {
    const angle = areaFormSchema.safeParse(
      values({ grain: grain({ kind: 'angle', angleDeg: 'north' }) }),
    );
    expect(angle.success).toBe(false);
    expect(angle.error?.issues[0]?.path).toEqual(['grain', 'angleDeg']);
    const tolerance = areaFormSchema.safeParse(
      values({ grain: grain({ kind: 'facing', toleranceDeg: '200' }) }),
    );
    expect(tolerance.error?.issues[0]?.path).toEqual(['grain', 'toleranceDeg']);
    // Fields of the other grain choices are not checked.
    expect(areaFormSchema.safeParse(values({ grain: grain({ angleDeg: 'x' }) })).success).toBe(
      true,
    );
    expect(areaFormSchema.safeParse(values({ name: '  ' })).success).toBe(false);
  });

  it('opens a saved area with its choices', () => {
    const saved = {
      name: 'Dog run',
      usage: 'pet' as const,
      turfProductId: null,
      rollWidthFt: 12,
      baseDepthIn: 4,
      grainChoice: {
        kind: 'facing' as const,
        facing: 'W' as const,
        toleranceDeg: 0,
        toward: 'house' as const,
      },
    };
    expect(areaFormDefaults(saved, null)).toMatchObject({
      name: 'Dog run',
      turfProductId: '',
      roll: { widthFt: '12' },
      baseDepthFt: 4 / 12,
      grain: { kind: 'facing', facing: 'W', toward: 'house', toleranceDeg: '' },
    });
  });
});
