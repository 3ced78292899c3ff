import { describe, expect, it } from 'vitest';
import {
  feetPerPixel,
  underlayFeetToPixel,
  underlayPixelToFeet,
  underlayScaleInputSchema,
} from './underlay.js';

// Plain geometry (from memory): feet per pixel is the known distance over the pixel distance.
describe('feetPerPixel', () => {
  it('gives 0.1 ft per pixel for two points 100 px apart and 10 ft', () => {
    expect(feetPerPixel({ x: 0, y: 0 }, { x: 100, y: 0 }, 10)).toBeCloseTo(0.1, 12);
  });

  it('measures a slanted pair along the line between them (a 3-4-5 triangle)', () => {
    expect(feetPerPixel({ x: 10, y: 10 }, { x: 40, y: 50 }, 25)).toBeCloseTo(0.5, 12);
  });

  it('refuses coinciding points and a distance that is not above 0', () => {
    expect(() => feetPerPixel({ x: 5, y: 5 }, { x: 5, y: 5 }, 10)).toThrow(RangeError);
    expect(() => feetPerPixel({ x: 0, y: 0 }, { x: 1, y: 0 }, 0)).toThrow(RangeError);
    expect(() => feetPerPixel({ x: 0, y: 0 }, { x: 1, y: 0 }, Infinity)).toThrow(RangeError);
  });
});

describe('underlayPixelToFeet', () => {
  it('puts the top-left pixel at the offset and pixel rows toward the south', () => {
    const placement = { feetPerPixel: 0.1, offsetFt: { x: 2, y: 30 }, rotationDeg: 0 };
    expect(underlayPixelToFeet(placement, { x: 0, y: 0 })).toEqual({ x: 2, y: 30 });
    const p = underlayPixelToFeet(placement, { x: 100, y: 50 });
    expect(p.x).toBeCloseTo(12, 9);
    expect(p.y).toBeCloseTo(25, 9);
  });

  it('turns the image counter-clockwise about its top-left corner', () => {
    const placement = { feetPerPixel: 1, offsetFt: { x: 0, y: 0 }, rotationDeg: 90 };
    const p = underlayPixelToFeet(placement, { x: 10, y: 0 });
    expect(p.x).toBeCloseTo(0, 9);
    expect(p.y).toBeCloseTo(10, 9);
  });
});

describe('underlayFeetToPixel', () => {
  it('undoes underlayPixelToFeet, turned or not', () => {
    for (const rotationDeg of [0, 30, -120]) {
      const placement = { feetPerPixel: 0.04, offsetFt: { x: -3, y: 12 }, rotationDeg };
      const back = underlayFeetToPixel(placement, underlayPixelToFeet(placement, { x: 77, y: 41 }));
      expect(back.x).toBeCloseTo(77, 9);
      expect(back.y).toBeCloseTo(41, 9);
    }
  });
});

describe('underlayScaleInputSchema', () => {
  it('names the field at fault', () => {
    const paths = (value: unknown) => {
      const result = underlayScaleInputSchema.safeParse(value);
      return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
    };
    expect(paths({ a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, distanceFt: 0 })).toEqual([
      'distanceFt',
    ]);
    expect(paths({ a: { x: 0, y: 0 }, b: { x: 0, y: 0 }, distanceFt: 10 })).toEqual(['b']);
    expect(paths({ a: { x: -1, y: 0 }, b: { x: 5, y: 0 }, distanceFt: 1 })).toEqual(['a.x']);
    expect(paths({ a: { x: 0, y: 0 }, b: { x: 5, y: 0 }, distanceFt: 1, opacity: 2 })).toEqual([
      'opacity',
    ]);
  });
});
