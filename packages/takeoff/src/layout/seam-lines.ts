import type { Polygon } from 'polygon-clipping';
import { fromFrame } from '../geometry/grain-frame.js';
import { lengthInsideCapsules } from '../geometry/traffic.js';
import type { Capsule } from '../geometry/traffic.js';
import { SLIVER_FT } from './band-scan.js';
import type { AngleLayout } from './plan-at-angle.js';
import type { ClippedPart } from './clip-parts.js';
import type { SeamLine, TrafficSeamCrossing } from './types.js';
import { roundFt, roundPoint } from './rounding.js';

/** Stretches of the horizontal line v = `at` inside a polygon (frame coordinates), as u-ranges. */
function insideStretches(polygon: Polygon, at: number): [number, number][] {
  const crossings: number[] = [];
  for (const ring of polygon) {
    for (let i = 0; i < ring.length; i += 1) {
      const [ua, va] = ring[i] as [number, number];
      const [ub, vb] = ring[(i + 1) % ring.length] as [number, number];
      if (va > at !== vb > at) crossings.push(ua + ((at - va) / (vb - va)) * (ub - ua));
    }
  }
  crossings.sort((a, b) => a - b);
  const stretches: [number, number][] = [];
  for (let k = 0; k + 1 < crossings.length; k += 2)
    stretches.push([crossings[k] as number, crossings[k + 1] as number]);
  return stretches;
}

/** Side and butt seams of a layout as segments in area coordinates. */
export function seamLinesOf(layout: AngleLayout): SeamLine[] {
  const { frame } = layout.context.polygon;
  const seam = (
    kind: SeamLine['kind'],
    u0: number,
    v0: number,
    u1: number,
    v1: number,
  ): SeamLine => ({
    kind,
    from: roundPoint(fromFrame(frame, u0, v0)),
    to: roundPoint(fromFrame(frame, u1, v1)),
    lengthFt: roundFt(Math.hypot(u1 - u0, v1 - v0)),
  });
  const sides = layout.candidate.sideSeams.map((s) => seam('side', s.u, s.vFrom, s.u, s.vTo));
  const butts = layout.candidate.buttLines.flatMap((line) => {
    const part = layout.clipped[line.part] as ClippedPart;
    return insideStretches(part.polygon, line.v)
      .map(([a, b]): [number, number] => [Math.max(a, line.uMin), Math.min(b, line.uMax)])
      .filter(([a, b]) => b - a >= SLIVER_FT)
      .map(([a, b]) => seam('butt', a, line.v, b, line.v));
  });
  return [...sides, ...butts];
}

/** Seams that run through a walkway, with the length inside each path. */
export function trafficCrossings(
  seams: readonly SeamLine[],
  walkways: readonly (readonly Capsule[])[],
): TrafficSeamCrossing[] {
  const crossings: TrafficSeamCrossing[] = [];
  seams.forEach((line, seam) => {
    walkways.forEach((capsules, path) => {
      const lengthFt = roundFt(lengthInsideCapsules(line.from, line.to, capsules));
      if (lengthFt > 0) crossings.push({ seam, path, kind: line.kind, lengthFt });
    });
  });
  return crossings;
}
