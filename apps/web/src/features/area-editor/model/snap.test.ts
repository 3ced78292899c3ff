import { describe, expect, it } from 'vitest';
import { snapPoint } from './snap';

const grid = { gridFt: 1, angles: false };
const square = { gridFt: null, angles: true };
const both = { gridFt: 0.5, angles: true };

describe('snapPoint', () => {
  it('rounds to the grid step', () => {
    expect(
      snapPoint({ point: [3.4, 7.6], neighbours: [], snapping: grid, toleranceFt: 0 }),
    ).toEqual([3, 8]);
    expect(
      snapPoint({
        point: [3.3, 7.76],
        neighbours: [],
        snapping: { gridFt: 0.5, angles: false },
        toleranceFt: 0,
      }),
    ).toEqual([3.5, 8]);
  });

  it('leaves the point alone with snapping off', () => {
    expect(
      snapPoint({
        point: [3.37, 7.61],
        neighbours: [[0, 0]],
        snapping: { gridFt: null, angles: false },
        toleranceFt: 1,
      }),
    ).toEqual([3.37, 7.61]);
  });

  it('squares a side up to 90° against the previous point', () => {
    // 0.4 ft off the line east of (0, 0): pulled onto it.
    expect(
      snapPoint({ point: [12.3, 0.4], neighbours: [[0, 0]], snapping: square, toleranceFt: 0.5 }),
    ).toEqual([12.3, 0]);
    // Far off any square-up: left alone.
    expect(
      snapPoint({ point: [12.3, 4], neighbours: [[0, 0]], snapping: square, toleranceFt: 0.5 }),
    ).toEqual([12.3, 4]);
  });

  it('squares a dragged corner against both neighbours', () => {
    // Corner between (10, 0) and (0, 8): x from the first, y from the second → (10, 8).
    expect(
      snapPoint({
        point: [10.3, 7.8],
        neighbours: [
          [10, 0],
          [0, 8],
        ],
        snapping: square,
        toleranceFt: 0.5,
      }),
    ).toEqual([10, 8]);
  });

  it('makes a side near 45° exactly 45°, on the grid', () => {
    const [x, y] = snapPoint({
      point: [6.2, 5.9],
      neighbours: [[0, 0]],
      snapping: both,
      toleranceFt: 0.5,
    });
    expect(x).toBe(y);
    expect(x).toBe(6);
    expect(
      snapPoint({ point: [-4.1, 3.8], neighbours: [[0, 0]], snapping: square, toleranceFt: 0.5 }),
    ).toEqual([-3.95, 3.95]);
  });
});
