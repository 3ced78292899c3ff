import type { Point } from './types.js';

/** A stretch of a walkway: the points within `radiusFt` of the segment a→b. */
export interface Capsule {
  readonly a: Point;
  readonly b: Point;
  readonly radiusFt: number;
}

/** Splits a polyline walkway of a given width into capsules, one per segment. */
export function walkwayCapsules(points: readonly Point[], widthFt: number): Capsule[] {
  const radiusFt = widthFt / 2;
  if (points.length === 1) return [{ a: points[0] as Point, b: points[0] as Point, radiusFt }];
  return points.slice(1).map((b, i) => ({ a: points[i] as Point, b, radiusFt }));
}

type Interval = [number, number];

function linearInterval(k: number, c: number, lo: number, hi: number): Interval | null {
  // lo ≤ k·t + c ≤ hi
  if (k === 0) return c >= lo && c <= hi ? [-Infinity, Infinity] : null;
  const t1 = (lo - c) / k;
  const t2 = (hi - c) / k;
  return [Math.min(t1, t2), Math.max(t1, t2)];
}

function intersect(a: Interval | null, b: Interval | null): Interval | null {
  if (!a || !b) return null;
  const lo = Math.max(a[0], b[0]);
  const hi = Math.min(a[1], b[1]);
  return lo <= hi ? [lo, hi] : null;
}

function diskInterval(p: Point, d: Point, centre: Point, r: number): Interval | null {
  const fx = p[0] - centre[0];
  const fy = p[1] - centre[1];
  const a = d[0] * d[0] + d[1] * d[1];
  const b = 2 * (fx * d[0] + fy * d[1]);
  const c = fx * fx + fy * fy - r * r;
  if (a === 0) return c <= 0 ? [-Infinity, Infinity] : null;
  const disc = b * b - 4 * a * c;
  if (disc < 0) return null;
  const root = Math.sqrt(disc);
  return [(-b - root) / (2 * a), (-b + root) / (2 * a)];
}

/** Parameter range t ∈ [0, 1] of segment p→q inside one capsule, or null. */
function capsuleInterval(p: Point, q: Point, capsule: Capsule): Interval | null {
  const d: Point = [q[0] - p[0], q[1] - p[1]];
  const { a, b, radiusFt: r } = capsule;
  const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const pieces: Interval[] = [];
  for (const centre of [a, b]) {
    const disk = diskInterval(p, d, centre, r);
    if (disk) pieces.push(disk);
  }
  if (length > 0) {
    const e: Point = [(b[0] - a[0]) / length, (b[1] - a[1]) / length];
    const fx = p[0] - a[0];
    const fy = p[1] - a[1];
    const along = linearInterval(d[0] * e[0] + d[1] * e[1], fx * e[0] + fy * e[1], 0, length);
    const side = linearInterval(d[0] * -e[1] + d[1] * e[0], fx * -e[1] + fy * e[0], -r, r);
    const slab = intersect(along, side);
    if (slab) pieces.push(slab);
  }
  if (pieces.length === 0) return null;
  // A capsule is convex, so its pieces along a line join into one interval.
  const hull: Interval = [
    Math.min(...pieces.map((x) => x[0])),
    Math.max(...pieces.map((x) => x[1])),
  ];
  return intersect(hull, [0, 1]);
}

/** Length (ft) of segment p→q lying inside any of the capsules (overlaps counted once). */
export function lengthInsideCapsules(p: Point, q: Point, capsules: readonly Capsule[]): number {
  const intervals = capsules
    .map((capsule) => capsuleInterval(p, q, capsule))
    .filter((interval): interval is Interval => interval !== null)
    .sort((x, y) => x[0] - y[0]);
  let covered = 0;
  let reach = -Infinity;
  for (const [lo, hi] of intervals) {
    const start = Math.max(lo, reach);
    if (hi > start) covered += hi - start;
    reach = Math.max(reach, hi);
  }
  return covered * Math.hypot(q[0] - p[0], q[1] - p[1]);
}
