import type { Point } from './types.js';

/**
 * Coordinates are snapped to this grid (2^-20 ft, about 0.00001 in) after rotation, so that
 * strip boundaries placed through a vertex hit it exactly and rounding noise from the
 * rotation cannot open hair-thin slivers between a strip edge and a yard edge.
 */
export const SNAP_FT = 2 ** -20;

/** Rounds a coordinate to the snapping grid. */
export function snap(value: number): number {
  return Math.round(value / SNAP_FT) * SNAP_FT;
}

/**
 * The frame of one grain direction: `v` runs along the grain (the roll's length), `u` runs
 * across it (the roll's width), and (u, v) is right-handed. For grain 90° (north) u = x and
 * v = y; for grain 0° (east) u = -y and v = x.
 */
export interface GrainFrame {
  readonly angleDeg: number;
  readonly cos: number;
  readonly sin: number;
}

const EXACT_QUARTERS: readonly (readonly [number, number])[] = [
  [1, 0],
  [0, 1],
  [-1, 0],
  [0, -1],
];

/** Normalises an angle to [0, 360). */
export function normalizeDegrees(angleDeg: number): number {
  const turned = angleDeg % 360;
  return turned < 0 ? turned + 360 : turned === 0 ? 0 : turned;
}

/** Builds the frame for a grain angle (degrees counter-clockwise from +x); exact at quarter turns. */
export function grainFrame(angleDeg: number): GrainFrame {
  const angle = normalizeDegrees(angleDeg);
  const quarter = angle / 90;
  const exact = Number.isInteger(quarter) ? EXACT_QUARTERS[quarter] : undefined;
  if (exact) return { angleDeg: angle, cos: exact[0], sin: exact[1] };
  const radians = (angle * Math.PI) / 180;
  return { angleDeg: angle, cos: Math.cos(radians), sin: Math.sin(radians) };
}

/** Area coordinates → frame coordinates `[u, v]`, unsnapped. */
export function toFrame(frame: GrainFrame, point: Point): [number, number] {
  const [x, y] = point;
  return [x * frame.sin - y * frame.cos, x * frame.cos + y * frame.sin];
}

/** Frame coordinates → area coordinates `[x, y]`. */
export function fromFrame(frame: GrainFrame, u: number, v: number): [number, number] {
  return [u * frame.sin + v * frame.cos, -u * frame.cos + v * frame.sin];
}
