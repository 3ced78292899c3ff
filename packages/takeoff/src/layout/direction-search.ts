import type { Capsule } from '../geometry/traffic.js';
import { edgeLengths } from '../geometry/ring.js';
import { compareCandidates } from './evaluate-offset.js';
import type { AngleContext, LayoutCandidate } from './evaluate-offset.js';
import { searchOffsets } from './offset-search.js';
import { angleContext, finishAngle } from './plan-at-angle.js';
import type { AngleLayout } from './plan-at-angle.js';
import type { LayoutRequest } from './types.js';

/** Longest edges whose directions are tried besides the whole degrees. */
const EDGE_DIRECTIONS = 24;
/** Directions around which finer angles are tried, and how many are rebuilt at the end. */
const REFINE_DIRECTIONS = 3;
const FINAL_DIRECTIONS = 3;
const REFINE_STEPS_DEG = [-0.5, -0.4, -0.3, -0.2, -0.1, -0.05, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5];

/** Rounds a direction to 1/10000 degree in [0, 180), so a reported angle replays exactly. */
export function roundDirection(angleDeg: number): number {
  const turned = ((angleDeg % 180) + 180) % 180;
  const rounded = Math.round(turned * 1e4) / 1e4;
  return rounded >= 180 ? 0 : rounded;
}

function edgeDirections(request: LayoutRequest): number[] {
  const rings = [request.area.outer, ...request.area.holes];
  const edges = rings.flatMap((ring) =>
    edgeLengths(ring).map((length, i) => {
      const a = ring[i] as readonly [number, number];
      const b = ring[(i + 1) % ring.length] as readonly [number, number];
      return { length, angle: (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI };
    }),
  );
  return edges
    .filter((edge) => edge.length >= 1)
    .sort((x, y) => y.length - x.length)
    .slice(0, EDGE_DIRECTIONS)
    .map((edge) => roundDirection(edge.angle));
}

interface Screened {
  readonly angle: number;
  readonly context: AngleContext;
  readonly layouts: LayoutCandidate[];
}

function screenAll(
  request: LayoutRequest,
  angles: readonly number[],
  walkways: readonly (readonly Capsule[])[],
  seen: Set<number>,
): Screened[] {
  const result: Screened[] = [];
  for (const angle of angles) {
    if (seen.has(angle)) continue;
    seen.add(angle);
    const context = angleContext(request, angle, walkways);
    result.push({ angle, context, layouts: searchOffsets(context) });
  }
  return result;
}

function rank(screened: Screened[]): Screened[] {
  return screened
    .map((entry, order) => ({ entry, order }))
    .sort((a, b) => compareCandidates(a.entry.layouts[0]!, b.entry.layouts[0]!) || a.order - b.order)
    .map(({ entry }) => entry);
}

/**
 * Free direction: every whole degree 0–179, the directions of the longest edges, then finer
 * angles around the best few — each screened over strip offsets with the fast scan. The best
 * few directions are rebuilt with polygon clipping and the best rebuilt layout wins. Ties go
 * to the direction tried first (whole degrees in order, then edge directions, then refinements).
 * Returns the winner first, then the other rebuilt directions.
 */
export function searchDirections(request: LayoutRequest, walkways: readonly (readonly Capsule[])[]): AngleLayout[] {
  const seen = new Set<number>();
  const wholeDegrees = Array.from({ length: 180 }, (_, degree) => degree);
  let screened = rank(screenAll(request, [...wholeDegrees, ...edgeDirections(request)], walkways, seen));
  const finer = screened
    .slice(0, REFINE_DIRECTIONS)
    .flatMap((entry) => REFINE_STEPS_DEG.map((delta) => roundDirection(entry.angle + delta)));
  screened = rank([...screened, ...screenAll(request, finer, walkways, seen)]);
  const finals = screened.slice(0, FINAL_DIRECTIONS).map((entry) => finishAngle(entry.context, entry.layouts));
  return finals
    .map((layout, order) => ({ layout, order }))
    .sort((a, b) => compareCandidates(a.layout.candidate, b.layout.candidate) || a.order - b.order)
    .map(({ layout }) => layout);
}
