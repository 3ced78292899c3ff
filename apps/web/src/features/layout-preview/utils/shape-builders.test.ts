import { describe, expect, it } from 'vitest';
import { buildFromPoints, buildLShape, buildRectangle, pointsToText } from './shape-builders';

describe('shape builders', () => {
  it('builds a rectangle with its length north–south from trade-typed lengths', () => {
    // 27' 6" = 27.5 ft; 12 ft 6 in = 12.5 ft (arithmetic).
    expect(buildRectangle(`27' 6"`, '12 ft 6 in')).toEqual({
      ok: true,
      outer: [
        [0, 0],
        [12.5, 0],
        [12.5, 27.5],
        [0, 27.5],
      ],
      holes: [],
    });
  });

  it('names each field that does not read, with the parser’s message', () => {
    const result = buildRectangle('', `20' 14"`);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.len).toBe('Enter a length');
    expect(result.errors.wid).toMatch(/^Inches must be less than 12/);
  });

  it('refuses a zero length', () => {
    expect(buildRectangle('0', '10')).toEqual({
      ok: false,
      errors: { len: 'A length must be more than 0' },
    });
  });

  it('builds an L with the notch out of the north-east corner', () => {
    // Overall 30 ft N–S × 40 ft E–W, notch 15 × 20: 1200 − 300 = 900 sq ft, the sample L (arithmetic).
    expect(buildLShape('30', '40', '15', '20')).toEqual({
      ok: true,
      outer: [
        [0, 0],
        [40, 0],
        [40, 15],
        [20, 15],
        [20, 30],
        [0, 30],
      ],
      holes: [],
    });
  });

  it('refuses a notch as big as the L itself', () => {
    expect(buildLShape('30', '40', '30', '45')).toEqual({
      ok: false,
      errors: {
        nlen: 'The notch must be shorter than the overall length',
        nwid: 'The notch must be narrower than the overall width',
      },
    });
  });

  it('reads points one per line, with commas or spaces, negatives, trade lengths and holes', () => {
    const result = buildFromPoints(`0, 0\n\n-10 0\n-10, 8' 6"\n0,8.5\nhole\n-4, 2\n-3, 2\n-3, 3`);
    expect(result).toEqual({
      ok: true,
      outer: [
        [0, 0],
        [-10, 0],
        [-10, 8.5],
        [0, 8.5],
      ],
      holes: [
        [
          [-4, 2],
          [-3, 2],
          [-3, 3],
        ],
      ],
    });
  });

  it('drops a point typed twice and a closing point, as the planner counts edges', () => {
    expect(buildFromPoints('0,0\n10,0\n10,0\n10,8\n0,8\n0,0')).toMatchObject({
      ok: true,
      outer: [
        [0, 0],
        [10, 0],
        [10, 8],
        [0, 8],
      ],
    });
  });

  it('says which line of points is wrong and why', () => {
    expect(buildFromPoints('0, 0\n10, 0\n10, 5, 2')).toEqual({
      ok: false,
      errors: { pts: 'Line 3: Write a point as x, y in feet, such as 12, 7.5' },
    });
    expect(buildFromPoints('0, 0\n10, abc')).toEqual({
      ok: false,
      errors: { pts: 'Line 2: y: "abc" is not a length; try 27\' 6", 27 ft 6 in or 27.5' },
    });
    expect(buildFromPoints('0, 0\n10, 0')).toEqual({
      ok: false,
      errors: { pts: 'An outline needs at least 3 points; there are 2' },
    });
    expect(buildFromPoints('0,0\n9,0\n9,9\nhole\n1,1\n2,1')).toEqual({
      ok: false,
      errors: { pts: 'Hole 1 needs at least 3 points' },
    });
  });

  it('writes points back as text that reads the same', () => {
    const text = pointsToText([
      [0, 0],
      [12.345, 0],
      [12.345, 7.001],
    ]);
    expect(text).toBe('0, 0\n12.35, 0\n12.35, 7');
    expect(buildFromPoints(text)).toMatchObject({
      ok: true,
      outer: [
        [0, 0],
        [12.35, 0],
        [12.35, 7],
      ],
    });
  });
});
