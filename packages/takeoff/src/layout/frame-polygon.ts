import { grainFrame, snap, toFrame } from '../geometry/grain-frame.js';
import type { GrainFrame } from '../geometry/grain-frame.js';
import type { Ring } from '../geometry/types.js';

/**
 * The area turned into one grain frame and snapped: flat coordinate arrays for the fast
 * band scan (see {@link framePairs} for polygon-clipping). Ring 0 is the outer ring.
 */
export interface FramePolygon {
  readonly frame: GrainFrame;
  readonly u: Float64Array;
  readonly v: Float64Array;
  /** Start index of each ring in `u`/`v`, with the total count appended. */
  readonly ringStart: Int32Array;
  readonly uMin: number;
  readonly uMax: number;
  readonly vMin: number;
  readonly vMax: number;
}

/** Turns the area into the frame of `angleDeg` (the grain direction). */
export function toFramePolygon(
  angleDeg: number,
  outer: Ring,
  holes: readonly Ring[],
): FramePolygon {
  const frame = grainFrame(angleDeg);
  const sourceRings = [outer, ...holes];
  const total = sourceRings.reduce((sum, ring) => sum + ring.length, 0);
  const u = new Float64Array(total);
  const v = new Float64Array(total);
  const ringStart = new Int32Array(sourceRings.length + 1);
  let index = 0;
  let uMin = Infinity;
  let uMax = -Infinity;
  let vMin = Infinity;
  let vMax = -Infinity;
  sourceRings.forEach((ring, r) => {
    ringStart[r] = index;
    for (const point of ring) {
      const [pu, pv] = toFrame(frame, point);
      const su = snap(pu);
      const sv = snap(pv);
      u[index] = su;
      v[index] = sv;
      uMin = Math.min(uMin, su);
      uMax = Math.max(uMax, su);
      vMin = Math.min(vMin, sv);
      vMax = Math.max(vMax, sv);
      index += 1;
    }
  });
  ringStart[sourceRings.length] = index;
  return { frame, u, v, ringStart, uMin, uMax, vMin, vMax };
}

/** The frame polygon's rings as coordinate pairs, the shape polygon-clipping takes. */
export function framePairs(polygon: FramePolygon): [number, number][][] {
  const rings: [number, number][][] = [];
  for (let r = 0; r + 1 < polygon.ringStart.length; r += 1) {
    const ring: [number, number][] = [];
    for (let i = polygon.ringStart[r] as number; i < (polygon.ringStart[r + 1] as number); i += 1) {
      ring.push([polygon.u[i] as number, polygon.v[i] as number]);
    }
    rings.push(ring);
  }
  return rings;
}
