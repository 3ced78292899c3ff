import { isPointInRing, signedArea } from './ring.js';
import { forEachNearbyEdgePair, ringEdges, segmentContact } from './segments.js';
import type { RingEdge } from './segments.js';
import type { Point, Ring } from './types.js';

/** What is wrong with an area's rings: the field path and a one-line description. */
export interface RingProblem {
  readonly path: string;
  readonly detail: string;
}

/** Formats a point for messages: up to 3 decimals, no trailing zeros. */
export function formatPoint(point: Point): string {
  const show = (value: number): string => String(Math.round(value * 1000) / 1000);
  return `(${show(point[0])}, ${show(point[1])})`;
}

function areAdjacent(e: RingEdge, f: RingEdge, ringLength: number): boolean {
  const gap = Math.abs(e.index - f.index);
  return gap === 1 || gap === ringLength - 1;
}

/** A spike: two consecutive edges that fold back onto each other along one line. */
function foldPoint(e: RingEdge, f: RingEdge, ringLength: number): Point | null {
  const [first, second] = (e.index + 1) % ringLength === f.index ? [e, f] : [f, e];
  const shared = first.b;
  const ux = first.a[0] - shared[0];
  const uy = first.a[1] - shared[1];
  const vx = second.b[0] - shared[0];
  const vy = second.b[1] - shared[1];
  return ux * vy - uy * vx === 0 && ux * vx + uy * vy > 0 ? shared : null;
}

/** First self-contact of one ring (crossing, touching or folding back), or null. */
export function findSelfContact(ring: Ring): Point | null {
  let found: Point | null = null;
  const edges = ringEdges([ring]);
  forEachNearbyEdgePair(edges, (e, f) => {
    found = areAdjacent(e, f, ring.length) ? foldPoint(e, f, ring.length) : segmentContact(e, f);
    return found !== null;
  });
  return found;
}

/** First contact between edges of two different rings, or null. */
export function findContactBetween(a: Ring, b: Ring): Point | null {
  let found: Point | null = null;
  forEachNearbyEdgePair(ringEdges([a, b]), (e, f) => {
    found = e.ring === f.ring ? null : segmentContact(e, f);
    return found !== null;
  });
  return found;
}

/**
 * Checks that the outer ring and each hole are simple rings with area, that every hole lies
 * strictly inside the outer ring, and that holes neither touch nor overlap each other.
 * Rings arrive normalised (no repeated points). Returns the first problem found or null.
 */
export function findRingProblem(outer: Ring, holes: readonly Ring[]): RingProblem | null {
  const rings: { path: string; ring: Ring }[] = [
    { path: 'area.outer', ring: outer },
    ...holes.map((ring, i) => ({ path: `area.holes[${i}]`, ring })),
  ];
  for (const { path, ring } of rings) {
    if (ring.length < 3) return { path, detail: 'needs at least 3 points' };
    const contact = findSelfContact(ring);
    if (contact) return { path, detail: `ring self-intersects at ${formatPoint(contact)}` };
    if (signedArea(ring) === 0) return { path, detail: 'ring has zero area' };
  }
  for (const [i, hole] of holes.entries()) {
    const path = `area.holes[${i}]`;
    const contact = findContactBetween(outer, hole);
    if (contact)
      return { path, detail: `hole touches or crosses the outer ring at ${formatPoint(contact)}` };
    if (!isPointInRing(hole[0] as Point, outer))
      return { path, detail: 'hole lies outside the outer ring' };
  }
  for (const [i, hole] of holes.entries()) {
    for (let j = i + 1; j < holes.length; j += 1) {
      const other = holes[j] as Ring;
      const contact = findContactBetween(hole, other);
      const overlaps =
        contact ??
        (isPointInRing(other[0] as Point, hole) || isPointInRing(hole[0] as Point, other)
          ? other[0]
          : null);
      if (overlaps) {
        return {
          path: `area.holes[${j}]`,
          detail: `hole overlaps area.holes[${i}] at ${formatPoint(overlaps)}`,
        };
      }
    }
  }
  return null;
}
