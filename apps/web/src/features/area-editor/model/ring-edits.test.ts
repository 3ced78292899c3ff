import { describe, expect, it } from 'vitest';
import { edgeLengths } from '@seamwright/takeoff';
import {
  directionDeg,
  insertRingPoint,
  pointAlong,
  removeRingPoint,
  ringOf,
  setPathSideLength,
  setRingSideLength,
  setSideDirection,
} from './ring-edits';
import { outlineTemplate, polygonise } from './templates';

const rectangle = outlineTemplate('rectangle'); // 30 × 20 ft, side 0 south, 1 east, 2 north, 3 west

describe('typed side lengths', () => {
  it('keeps a rectangle square: the opposite side follows', () => {
    const points = setRingSideLength(rectangle, 0, 42.5);
    expect(points).toEqual([
      [0, 0],
      [42.5, 0],
      [42.5, 20],
      [0, 20],
    ]);
  });

  it('keeps an L an L: the next parallel side takes up the change', () => {
    const l = outlineTemplate('l-shape');
    // West side (side 5, from (0, 25) down to (0, 0)) made 30 ft: the points from (0, 25) back
    // to the start move; the next side parallel to it is side 1, so (0, 0) and (30, 0) move.
    const points = setRingSideLength(l, 5, 30);
    expect(points).not.toBeNull();
    expect(edgeLengths(points ?? [])).toEqual([30, 15, 15, 15, 15, 30]);
    // South side made 40 ft: the east arm moves out, the notch's north-facing side grows.
    expect(edgeLengths(setRingSideLength(l, 0, 40) ?? [])).toEqual([40, 10, 25, 15, 15, 25]);
  });

  it('moves every other point when no side runs parallel', () => {
    const triangle = ringOf([
      [0, 0],
      [10, 0],
      [0, 10],
    ]);
    expect(setRingSideLength(triangle, 0, 20)).toEqual([
      [0, 0],
      [20, 0],
      [10, 10],
    ]);
  });

  it('refuses a side with no length', () => {
    expect(
      setRingSideLength(
        ringOf([
          [0, 0],
          [0, 0],
          [5, 5],
        ]),
        0,
        4,
      ),
    ).toBeNull();
  });

  it('stretches a walkway segment, moving the points after it', () => {
    const path = {
      points: [
        [0, 0],
        [10, 0],
        [10, 5],
      ] as const,
      widthFt: 3,
    };
    expect(setPathSideLength(path, 0, 12)).toEqual([
      [0, 0],
      [12, 0],
      [12, 5],
    ]);
  });
});

describe('directions', () => {
  it('reads and places directions counter-clockwise from east', () => {
    expect(directionDeg([0, 0], [0, 5])).toBe(90);
    expect(directionDeg([0, 0], [-5, -5])).toBe(225);
    expect(pointAlong([1, 1], 180, 4)).toEqual([-3, 1]);
  });

  it('swings the points after a turned side along with it', () => {
    const points = setSideDirection(
      [
        [0, 0],
        [10, 0],
        [10, 10],
        [0, 10],
      ],
      1,
      45,
      true,
    );
    const s = Math.round(10 * Math.SQRT1_2 * 1e6) / 1e6;
    expect(points).toEqual([
      [0, 0],
      [10, 0],
      [10 + s, s],
      [s, s],
    ]);
  });
});

describe('tags stay with their sides', () => {
  it('splits a side into two with the same tag, and merges on removal', () => {
    const tagged = { ...rectangle, tags: ['fence', 'house', 'bed', 'lawn'] as const };
    const split = insertRingPoint(tagged, 1, [15, 0]);
    expect(split.tags).toEqual(['fence', 'fence', 'house', 'bed', 'lawn']);
    expect(removeRingPoint(split, 1).tags).toEqual(['fence', 'house', 'bed', 'lawn']);
    // Removing the corner between the south (fence) and east (house) sides keeps the fence.
    expect(removeRingPoint(tagged, 1).tags).toEqual(['fence', 'bed', 'lawn']);
  });

  it('polygonises a circle on the radius', () => {
    const ring = polygonise([0, 0], 6, 24);
    expect(ring).toHaveLength(24);
    for (const [x, y] of ring) expect(Math.hypot(x, y)).toBeCloseTo(6, 5);
  });
});
