import type { FramePolygon } from './frame-polygon.js';
import { ChainSet } from './chain-set.js';

/**
 * Parts narrower or shorter than this (feet) are hair-thin slivers between a strip edge and a
 * yard edge that nobody would cut turf for; both the fast scan and the final clipping drop them.
 */
export const SLIVER_FT = 1e-4;

/** One connected part of the area inside one strip (band), as extents in the grain frame. */
export interface BandPart {
  readonly band: number;
  readonly uMin: number;
  readonly uMax: number;
  readonly vMin: number;
  readonly vMax: number;
}

/** A stretch of a strip boundary with area on both sides: a side seam, in frame coordinates. */
export interface SideSeamSpan {
  readonly line: number;
  readonly u: number;
  readonly vFrom: number;
  readonly vTo: number;
}

/** The parts and side seams of the area cut by strip boundaries at `lines`. */
export interface BandScan {
  readonly parts: BandPart[];
  readonly sideSeams: SideSeamSpan[];
}

/**
 * Zone of a coordinate among sorted boundaries: 2j when exactly on boundary j, 2j + 1 when
 * strictly between boundaries j and j + 1. Boundaries are treated as infinitely thin gaps:
 * each band is the open strip between two boundaries, so a yard edge lying on a boundary
 * belongs to no band and creates no zero-width part.
 */
function zoneOf(value: number, lines: ArrayLike<number>): number {
  let low = 0;
  let high = lines.length - 1;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if ((lines[mid] as number) <= value) low = mid;
    else high = mid - 1;
  }
  return value === lines[low] ? 2 * low : 2 * low + 1;
}

/**
 * Fast exact scan of the area against strip boundaries (sorted, first ≤ uMin, last ≥ uMax).
 * Walks every ring once, splitting it into chains inside each band; chains whose ends are
 * joined by an inside stretch of a boundary belong to the same connected part (union-find).
 * Cost is linear in the vertex count plus a sort of the boundary crossings.
 */
export function scanBands(polygon: FramePolygon, lines: ArrayLike<number>): BandScan {
  const { u, v, ringStart } = polygon;
  const chains = new ChainSet(lines);
  for (let r = 0; r + 1 < ringStart.length; r += 1) {
    const start = ringStart[r] as number;
    const count = (ringStart[r + 1] as number) - start;
    const firstZone = zoneOf(u[start] as number, lines);
    let current = firstZone % 2 === 1 ? chains.open((firstZone - 1) / 2, r) : -1;
    if (current >= 0) chains.extend(current, u[start] as number, v[start] as number);
    const startChain = current;
    let zoneP = firstZone;
    for (let i = 0; i < count; i += 1) {
      const p = start + i;
      const q = start + ((i + 1) % count);
      const zoneQ = zoneOf(u[q] as number, lines);
      if (zoneP !== zoneQ) current = chains.crossEdge(p, q, zoneP, zoneQ, current, u, v, r);
      if (zoneQ % 2 === 1) chains.extend(current, u[q] as number, v[q] as number);
      zoneP = zoneQ;
    }
    if (startChain >= 0) chains.union(current, startChain);
  }
  return chains.finish();
}
