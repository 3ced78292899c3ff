import type { Capsule } from '../geometry/traffic.js';
import { edgeLengths } from '../geometry/ring.js';
import { compareCandidates } from './evaluate-offset.js';
import type { AngleContext } from './evaluate-offset.js';
import type { OffsetScore, SearchBound } from './score-offset.js';
import { searchOffsets } from './offset-search.js';
import { angleContext, finishAngle } from './plan-at-angle.js';
import type { AngleLayout } from './plan-at-angle.js';
import type { LayoutRequest } from './types.js';

/** Longest edges whose directions are tried besides the whole degrees. */
const EDGE_DIRECTIONS = 16;
/** Directions around which finer angles are tried, and how many are rebuilt at the end. */
const REFINE_DIRECTIONS = 3;
const FINAL_DIRECTIONS = 3;
const REFINE_STEPS_DEG = [-0.5, -0.25, -0.1, 0.1, 0.25, 0.5];

/** Rounds a direction to 1/10000 degree in [0, 180), so a reported angle replays exactly. */
export function roundDirection(angleDeg: number): number {
  const turned = ((angleDeg % 180) + 180) % 180;
  const rounded = Math.round(turned * 1e4) / 1e4;
  return rounded >= 180 ? 0 : rounded;
}

/** Directions (0–180) of the longest edges of the area, longest first. */
export function edgeDirections(request: LayoutRequest): number[] {
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
  readonly layouts: OffsetScore[];
}

function screenAll(
  request: LayoutRequest,
  angles: readonly number[],
  walkways: readonly (readonly Capsule[])[],
  seen: Set<number>,
  bound: SearchBound,
): Screened[] {
  const result: Screened[] = [];
  for (const angle of angles) {
    if (seen.has(angle)) continue;
    seen.add(angle);
    const context = angleContext(request, angle, walkways);
    result.push({ angle, context, layouts: searchOffsets(context, bound) });
  }
  return result;
}

function rank(screened: Screened[]): Screened[] {
  return screened
    .map((entry, order) => ({ entry, order }))
    .sort(
      (a, b) => compareCandidates(a.entry.layouts[0]!, b.entry.layouts[0]!) || a.order - b.order,
    )
    .map(({ entry }) => entry);
}

/** The winning direction's layout and the screen figures of other directions worth showing. */
export interface DirectionSearch {
  readonly winner: AngleLayout;
  readonly others: readonly { readonly angle: number; readonly score: OffsetScore }[];
}

function angleGap(a: number, b: number): number {
  const gap = Math.abs(a - b) % 180;
  return Math.min(gap, 180 - gap);
}

/**
 * Free direction: every whole degree 0–179, the directions of the longest edges, then finer
 * angles around the best few — each screened over strip offsets with the fast scan (a shared
 * bound lets hopeless offsets skip packing). The best direction is rebuilt with polygon
 * clipping; should its figures differ from the screen, the next ones are rebuilt as well and
 * the best rebuilt layout wins. Ties go to the direction tried first (whole degrees in order,
 * then edge directions, then refinements).
 */
export function searchDirections(
  request: LayoutRequest,
  walkways: readonly (readonly Capsule[])[],
): DirectionSearch {
  const seen = new Set<number>();
  const bound: SearchBound = { units: Infinity };
  const wholeDegrees = Array.from({ length: 180 }, (_, degree) => degree);
  let screened = rank(
    screenAll(request, [...wholeDegrees, ...edgeDirections(request)], walkways, seen, bound),
  );
  const finer = screened
    .slice(0, REFINE_DIRECTIONS)
    .flatMap((entry) => REFINE_STEPS_DEG.map((delta) => roundDirection(entry.angle + delta)));
  screened = rank([...screened, ...screenAll(request, finer, walkways, seen, bound)]);
  let winner: AngleLayout | null = null;
  for (const entry of screened.slice(0, FINAL_DIRECTIONS)) {
    const layout = finishAngle(entry.context, entry.layouts);
    if (!winner || compareCandidates(layout.candidate, winner.candidate) < 0) winner = layout;
    if (compareCandidates(layout.candidate, entry.layouts[0]!) === 0) break;
  }
  if (!winner) throw new Error('no direction was evaluated');
  const chosen = winner.context.polygon.frame.angleDeg;
  const across = (Math.round(chosen) + 90) % 180;
  const others = [
    screened.find((entry) => angleGap(entry.angle, chosen) >= 10),
    screened.find((entry) => entry.angle === across),
  ]
    .filter((entry): entry is Screened => entry !== undefined)
    .filter((entry, i, list) => list.indexOf(entry) === i)
    .map((entry) => ({ angle: entry.angle, score: entry.layouts[0]! }));
  return { winner, others };
}
