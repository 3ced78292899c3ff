import type { EdgeTag } from '@seamwright/takeoff';
import type { EditorPath, EditorRing, Pt } from './types';

/**
 * Pure edits of one ring or walkway. A ring of n points has n sides (side i runs from point i
 * to point i + 1, the last one back to point 0) and one tag and one tight-curve mark per side,
 * so every edit here keeps `tags` and `curved` in step with the points.
 */

const PARALLEL_TOLERANCE = 1e-6;

export function add(a: Pt, b: Pt): Pt {
  return [a[0] + b[0], a[1] + b[1]];
}

export function sub(a: Pt, b: Pt): Pt {
  return [a[0] - b[0], a[1] - b[1]];
}

export function samePoint(a: Pt | undefined, b: Pt | undefined): boolean {
  return a !== undefined && b !== undefined && a[0] === b[0] && a[1] === b[1];
}

/** Direction of travel from `a` to `b`, degrees counter-clockwise from east, 0–360. */
export function directionDeg(a: Pt, b: Pt): number {
  const deg = (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
  return Math.round((((deg % 360) + 360) % 360) * 1e9) / 1e9;
}

/** A point `length` feet from `from` in the direction `angleDeg` (CCW from east). */
export function pointAlong(from: Pt, angleDeg: number, length: number): Pt {
  const rad = (angleDeg * Math.PI) / 180;
  // Rounded to a millionth of a foot so 90° turns give exact right angles.
  const round = (value: number) => Math.round(value * 1e6) / 1e6;
  return [round(from[0] + length * Math.cos(rad)), round(from[1] + length * Math.sin(rad))];
}

export function emptyRing(): EditorRing {
  return { points: [], tags: [], curved: [] };
}

export function ringOf(points: readonly Pt[], curved = false): EditorRing {
  return {
    points,
    tags: points.map(() => null),
    curved: points.map(() => curved),
  };
}

function insertAt<T>(list: readonly T[], index: number, value: T): T[] {
  return [...list.slice(0, index), value, ...list.slice(index)];
}

function removeAt<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index);
}

function replaceAt<T>(list: readonly T[], index: number, value: T): T[] {
  return list.map((item, i) => (i === index ? value : item));
}

/**
 * Puts a new point at `index` (1…n; n appends). The side it lands on is split in two and both
 * halves keep that side's tag and curve mark.
 */
export function insertRingPoint(ring: EditorRing, index: number, point: Pt): EditorRing {
  const split = index - 1;
  const tag: EdgeTag | null = split >= 0 ? (ring.tags[split] ?? null) : null;
  const curved = split >= 0 ? (ring.curved[split] ?? false) : false;
  return {
    points: insertAt(ring.points, index, point),
    tags: insertAt(ring.tags, index, tag),
    curved: insertAt(ring.curved, index, curved),
  };
}

/** Removes point `index`; the two sides that met there become one, keeping the first's tag. */
export function removeRingPoint(ring: EditorRing, index: number): EditorRing {
  return {
    points: removeAt(ring.points, index),
    tags: removeAt(ring.tags, index),
    curved: removeAt(ring.curved, index),
  };
}

export function moveRingPoint<R extends EditorRing | EditorPath>(
  line: R,
  index: number,
  point: Pt,
): R {
  return { ...line, points: replaceAt(line.points, index, point) };
}

export function setRingTag(ring: EditorRing, side: number, tag: EdgeTag | null): EditorRing {
  return { ...ring, tags: replaceAt(ring.tags, side, tag) };
}

export function setRingCurved(ring: EditorRing, side: number, curved: boolean): EditorRing {
  return { ...ring, curved: replaceAt(ring.curved, side, curved) };
}

/** Moves the points at the given indices by `delta`. */
function translate(points: readonly Pt[], indices: ReadonlySet<number>, delta: Pt): Pt[] {
  return points.map((point, i) => (indices.has(i) ? add(point, delta) : point));
}

function isParallel(a: Pt, b: Pt): boolean {
  const la = Math.hypot(a[0], a[1]);
  const lb = Math.hypot(b[0], b[1]);
  if (la === 0 || lb === 0) return false;
  return Math.abs(a[0] * b[1] - a[1] * b[0]) / (la * lb) < PARALLEL_TOLERANCE;
}

/**
 * Sets the length of side `side` of a closed ring, keeping its direction. The points after it
 * move along that direction up to the next side that runs parallel to it, which takes up the
 * difference, so a rectangle stays a rectangle and an L stays an L. With no parallel side
 * every other point moves and the side before it takes up the difference. Null when the
 * side has no length (no direction to keep).
 */
export function setRingSideLength(ring: EditorRing, side: number, lengthFt: number): Pt[] | null {
  const { points } = ring;
  const n = points.length;
  const a = points[side];
  const b = points[(side + 1) % n];
  if (!a || !b || n < 2) return null;
  const along = sub(b, a);
  const current = Math.hypot(along[0], along[1]);
  if (current === 0) return null;
  const scale = (lengthFt - current) / current;
  const delta: Pt = [along[0] * scale, along[1] * scale];
  const moved = new Set<number>();
  for (let step = 1; step < n; step += 1) {
    const j = (side + step) % n;
    moved.add(j);
    const next = points[(j + 1) % n] as Pt;
    if (isParallel(along, sub(next, points[j] as Pt))) break;
  }
  return roundPoints(translate(points, moved, delta));
}

/** Sets the length of segment `side` of an open walkway; the points after it move along. */
export function setPathSideLength(path: EditorPath, side: number, lengthFt: number): Pt[] | null {
  const a = path.points[side];
  const b = path.points[side + 1];
  if (!a || !b) return null;
  if (samePoint(a, b)) return null;
  const angle = directionDeg(a, b);
  const delta = sub(pointAlong(a, angle, lengthFt), b);
  const after = new Set(path.points.map((_, i) => i).filter((i) => i > side));
  return roundPoints(translate(path.points, after, delta));
}

/**
 * Turns side `side` to `angleDeg`, keeping its length: the points after it (up to the last
 * point) swing along with it, and the closing side takes up the change.
 */
export function setSideDirection(
  points: readonly Pt[],
  side: number,
  angleDeg: number,
  closed: boolean,
): Pt[] | null {
  const n = points.length;
  const a = points[side];
  const endIndex = closed ? (side + 1) % n : side + 1;
  const b = points[endIndex];
  if (!a || !b || samePoint(a, b)) return null;
  const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const delta = sub(pointAlong(a, angleDeg, length), b);
  const moved = new Set<number>(endIndex === 0 ? [0] : []);
  for (let i = endIndex; i > 0 && i < n; i += 1) moved.add(i);
  return roundPoints(translate(points, moved, delta));
}

/** Coordinates rounded to a millionth of a foot, so typed lengths give clean numbers. */
export function roundPoints(points: readonly Pt[]): Pt[] {
  const round = (value: number) => Math.round(value * 1e6) / 1e6;
  return points.map(([x, y]) => [round(x), round(y)]);
}
