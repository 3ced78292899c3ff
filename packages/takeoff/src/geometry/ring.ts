import type { Point, Ring } from './types.js';

/** Signed shoelace area of a ring (positive when counter-clockwise). */
export function signedArea(ring: Ring): number {
  let twice = 0;
  for (let i = 0; i < ring.length; i += 1) {
    const [x1, y1] = ring[i] as Point;
    const [x2, y2] = ring[(i + 1) % ring.length] as Point;
    twice += x1 * y2 - x2 * y1;
  }
  return twice / 2;
}

/** Length of each edge of a ring; edge i runs from point i to point i + 1. */
export function edgeLengths(ring: Ring): number[] {
  return ring.map((p, i) => {
    const q = ring[(i + 1) % ring.length] as Point;
    return Math.hypot(q[0] - p[0], q[1] - p[1]);
  });
}

/** Total length of a closed ring. */
export function ringPerimeter(ring: Ring): number {
  return edgeLengths(ring).reduce((sum, length) => sum + length, 0);
}

/**
 * Even-odd test: is the point strictly inside the ring? Points on the boundary may go either
 * way, so callers that care about the boundary test it separately.
 */
export function isPointInRing(point: Point, ring: Ring): boolean {
  const [px, py] = point;
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i, i += 1) {
    const [xi, yi] = ring[i] as Point;
    const [xj, yj] = ring[j] as Point;
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Is the point inside the outer ring and outside every hole (even-odd)? */
export function isPointInArea(point: Point, outer: Ring, holes: readonly Ring[]): boolean {
  return isPointInRing(point, outer) && !holes.some((hole) => isPointInRing(point, hole));
}

/**
 * Drops repeated consecutive points and a repeated closing point, so a ring given "closed"
 * (first point again at the end) and one given open mean the same thing.
 */
export function normalizeRing(points: readonly Point[]): Point[] {
  const result: Point[] = [];
  for (const point of points) {
    const last = result[result.length - 1];
    if (!last || last[0] !== point[0] || last[1] !== point[1]) result.push(point);
  }
  const first = result[0];
  const last = result[result.length - 1];
  if (result.length > 1 && first && last && first[0] === last[0] && first[1] === last[1])
    result.pop();
  return result;
}

/** Axis-aligned bounding box of some rings. */
export function boundingBox(rings: readonly Ring[]): {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
} {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const ring of rings) {
    for (const [x, y] of ring) {
      minX = Math.min(minX, x);
      minY = Math.min(minY, y);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
    }
  }
  return { minX, minY, maxX, maxY };
}
