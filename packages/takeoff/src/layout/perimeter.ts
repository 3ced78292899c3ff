import { edgeLengths, signedArea } from '../geometry/ring.js';
import type { EdgeTag, LayoutRequest } from './types.js';
import { roundSqFt } from './rounding.js';

/** Net area: outer ring minus holes (square feet, unrounded). */
export function netArea(request: LayoutRequest): number {
  const { outer, holes } = request.area;
  return (
    Math.abs(signedArea(outer)) - holes.reduce((sum, hole) => sum + Math.abs(signedArea(hole)), 0)
  );
}

/** Perimeter of the outer ring and all holes, in total and per edge tag (untagged: 'unknown'). */
export function perimeters(request: LayoutRequest): {
  total: number;
  byTag: Partial<Record<EdgeTag | 'unknown', number>>;
} {
  const rings = [
    { lengths: edgeLengths(request.area.outer), tags: request.edges },
    ...request.area.holes.map((hole, i) => ({
      lengths: edgeLengths(hole),
      tags: request.holeEdges?.[i],
    })),
  ];
  const byTag: Partial<Record<EdgeTag | 'unknown', number>> = {};
  let total = 0;
  for (const { lengths, tags } of rings) {
    lengths.forEach((length, i) => {
      const tag = tags?.[i] ?? 'unknown';
      byTag[tag] = (byTag[tag] ?? 0) + length;
      total += length;
    });
  }
  for (const tag of Object.keys(byTag) as (EdgeTag | 'unknown')[])
    byTag[tag] = roundSqFt(byTag[tag] ?? 0);
  return { total, byTag };
}
