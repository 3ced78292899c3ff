import { LayoutInputError } from './errors.js';
import { requireArray, requireRecord } from './read-fields.js';

/**
 * How much work one layout request may ask for. The planner's cost grows with the vertices
 * (every ring is scanned for each of ~200 directions × ~40 offsets), with the pairs of holes
 * (the overlap check) and with the number of cuts (the packing compares cuts with free
 * rectangles), so each of those inputs is capped. The API and the plan-layout command both
 * reject past these limits with the same message, naming the limit.
 */

/** Most points in one ring (outer or hole). */
export const MAX_RING_POINTS = 5000;
/** Most points across the outer ring and all holes together. */
export const MAX_TOTAL_VERTICES = 5000;
/** Most holes (planters, beds, trees) in one area. */
export const MAX_HOLES = 50;
/** Most traffic paths (walkways) in one request. */
export const MAX_TRAFFIC_PATHS = 20;
/** Most points in one traffic path. */
export const MAX_TRAFFIC_PATH_POINTS = 200;
/** Shortest length step (feet): one inch; turf is not cut finer than that. */
export const MIN_LENGTH_STEP_FT = 1 / 12;
/** Largest accepted coordinate magnitude (feet). */
export const MAX_COORDINATE_FT = 1e6;
/** Most strips a request may need across its widest direction. */
export const MAX_STRIPS = 2000;
/** Most pieces one strip may need along its length (area diameter ÷ longest piece). */
export const MAX_PIECES_PER_STRIP = 200;

function atMost(path: string, count: number, limit: number, what: string): void {
  if (count > limit)
    throw new LayoutInputError(path, `must have at most ${limit} ${what} (it has ${count})`);
}

/** A ring's point count, not counting a repeated closing point. */
function ringPointCount(path: string, ring: unknown): number {
  const points = requireArray(path, ring);
  const first: unknown = points[0];
  const last: unknown = points[points.length - 1];
  const closed =
    points.length > 1 &&
    Array.isArray(first) &&
    Array.isArray(last) &&
    first[0] === last[0] &&
    first[1] === last[1];
  return closed ? points.length - 1 : points.length;
}

/**
 * The size checks, cheap enough to run before anything else: they read only array lengths
 * (work proportional to the number of rings and paths, not to their points), so an
 * oversize request is refused before the quadratic ring checks or the planner see it.
 * Throws {@link LayoutInputError} naming the field and the limit.
 */
export function checkLayoutRequestSize(json: unknown): void {
  const body = requireRecord('request', json);
  const area = requireRecord('area', body.area);
  const outerCount = ringPointCount('area.outer', area.outer);
  atMost('area.outer', outerCount, MAX_RING_POINTS, 'points');
  const holes =
    area.holes === undefined || area.holes === null ? [] : requireArray('area.holes', area.holes);
  atMost('area.holes', holes.length, MAX_HOLES, 'holes');
  let total = outerCount;
  holes.forEach((hole, i) => {
    const count = ringPointCount(`area.holes[${i}]`, hole);
    atMost(`area.holes[${i}]`, count, MAX_RING_POINTS, 'points');
    total += count;
  });
  atMost('area', total, MAX_TOTAL_VERTICES, 'points across the outer ring and holes');
  if (body.trafficPaths !== undefined && body.trafficPaths !== null) {
    const paths = requireArray('trafficPaths', body.trafficPaths);
    atMost('trafficPaths', paths.length, MAX_TRAFFIC_PATHS, 'paths');
    paths.forEach((path, i) => {
      const isPlain = Array.isArray(path);
      const pointsPath = isPlain ? `trafficPaths[${i}]` : `trafficPaths[${i}].points`;
      const points = isPlain ? path : requireRecord(`trafficPaths[${i}]`, path).points;
      if (Array.isArray(points))
        atMost(pointsPath, points.length, MAX_TRAFFIC_PATH_POINTS, 'points');
    });
  }
}

/** The length step's lower bound, as the message gives it. */
export function checkLengthStep(lengthStepFt: number): void {
  if (lengthStepFt < MIN_LENGTH_STEP_FT - 1e-12)
    throw new LayoutInputError('lengthStepFt', 'must be at least 1 in (1/12 ft)');
}
