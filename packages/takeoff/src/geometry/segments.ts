import type { Point } from './types.js';

/** A straight segment between two points. */
export interface Segment {
  readonly a: Point;
  readonly b: Point;
}

function cross(o: Point, p: Point, q: Point): number {
  return (p[0] - o[0]) * (q[1] - o[1]) - (p[1] - o[1]) * (q[0] - o[0]);
}

function isOnSegment(p: Point, a: Point, b: Point): boolean {
  return (
    Math.min(a[0], b[0]) <= p[0] &&
    p[0] <= Math.max(a[0], b[0]) &&
    Math.min(a[1], b[1]) <= p[1] &&
    p[1] <= Math.max(a[1], b[1])
  );
}

/**
 * Where two closed segments meet (crossing, touching or overlapping), or null when they do
 * not. For overlaps one shared point is returned; exact floating-point orientation tests.
 */
export function segmentContact(s: Segment, t: Segment): Point | null {
  const d1 = cross(t.a, t.b, s.a);
  const d2 = cross(t.a, t.b, s.b);
  const d3 = cross(s.a, s.b, t.a);
  const d4 = cross(s.a, s.b, t.b);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    const ratio = d3 / (d3 - d4);
    return [t.a[0] + ratio * (t.b[0] - t.a[0]), t.a[1] + ratio * (t.b[1] - t.a[1])];
  }
  if (d1 === 0 && isOnSegment(s.a, t.a, t.b)) return s.a;
  if (d2 === 0 && isOnSegment(s.b, t.a, t.b)) return s.b;
  if (d3 === 0 && isOnSegment(t.a, s.a, s.b)) return t.a;
  if (d4 === 0 && isOnSegment(t.b, s.a, s.b)) return t.b;
  return null;
}

/** A segment tagged with the ring it belongs to and its index in that ring. */
export interface RingEdge extends Segment {
  readonly ring: number;
  readonly index: number;
}

/** Every edge of some rings, tagged with ring number and edge index. */
export function ringEdges(rings: readonly (readonly Point[])[]): RingEdge[] {
  return rings.flatMap((ring, r) =>
    ring.map((a, index) => ({ a, b: ring[(index + 1) % ring.length] as Point, ring: r, index })),
  );
}

/**
 * Calls `visit` for every pair of edges whose x-ranges overlap (a sweep over x), stopping
 * early when `visit` returns true. Keeps the validation near O(n log n) for real yards.
 */
export function forEachNearbyEdgePair(
  edges: readonly RingEdge[],
  visit: (e: RingEdge, f: RingEdge) => boolean,
): void {
  const sorted = [...edges].sort((e, f) => Math.min(e.a[0], e.b[0]) - Math.min(f.a[0], f.b[0]));
  for (let i = 0; i < sorted.length; i += 1) {
    const e = sorted[i] as RingEdge;
    const maxX = Math.max(e.a[0], e.b[0]);
    for (let j = i + 1; j < sorted.length; j += 1) {
      const f = sorted[j] as RingEdge;
      if (Math.min(f.a[0], f.b[0]) > maxX) break;
      if (visit(e, f)) return;
    }
  }
}
