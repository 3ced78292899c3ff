import { normalizeDegrees } from '../geometry/grain-frame.js';
import { walkwayCapsules } from '../geometry/traffic.js';
import { edgeDirections, roundDirection } from '../layout/direction-search.js';
import { compareCandidates } from '../layout/evaluate-offset.js';
import { searchOffsets } from '../layout/offset-search.js';
import { angleContext } from '../layout/plan-at-angle.js';
import type { OffsetScore, SearchBound } from '../layout/score-offset.js';
import type { LayoutRequest } from '../layout/types.js';
import { directedWithin } from './grain-facing.js';

/** Rounds a grain direction (0–360) to 1/10000°, so a reported angle replays exactly. */
function roundDirected(angleDeg: number): number {
  const rounded = Math.round(normalizeDegrees(angleDeg) * 1e4) / 1e4;
  return rounded >= 360 ? 0 : rounded;
}

/**
 * Directions to try within `centre ± tolerance` (tolerance under 90°): the facing itself,
 * both ends of the range, every whole degree inside and the directions of the longest edges
 * that fall inside — as grain directions (0–360) inside the range, facing first.
 */
function anglesInRange(request: LayoutRequest, centreDeg: number, toleranceDeg: number): number[] {
  const angles = [centreDeg, centreDeg - toleranceDeg, centreDeg + toleranceDeg].map(roundDirected);
  const first = Math.ceil(centreDeg - toleranceDeg);
  for (let degree = first; degree <= centreDeg + toleranceDeg; degree += 1)
    angles.push(roundDirected(degree));
  for (const direction of edgeDirections(request)) {
    const inside = directedWithin(direction, centreDeg, toleranceDeg);
    if (inside !== null) angles.push(roundDirected(inside));
  }
  return angles.filter((angle, i) => angles.indexOf(angle) === i);
}

/**
 * Grain directions within a facing range, best first by the single-area fast screen (strip
 * offsets scanned per direction, a shared bound skipping hopeless packing); at most `count`,
 * and always including the facing itself, so the range never plans worse than the facing.
 * Ties keep the facing first, then the order tried.
 */
export function screenRange(
  request: LayoutRequest,
  centreDeg: number,
  toleranceDeg: number,
  count: number,
): number[] {
  const angles = anglesInRange(request, centreDeg, toleranceDeg);
  const centre = angles[0] as number;
  if (toleranceDeg === 0 || angles.length === 1) return [centre];
  const walkways = request.trafficPaths.map((path) => walkwayCapsules(path.points, path.widthFt));
  const bound: SearchBound = { units: Infinity };
  const seen = new Map<number, OffsetScore>();
  const scored = angles.map((angle, order) => {
    const direction = roundDirection(angle);
    let best = seen.get(direction);
    if (!best) {
      const [first] = searchOffsets(angleContext(request, direction, walkways), bound);
      if (!first) throw new Error('no strip offset was screened');
      best = first;
      seen.set(direction, best);
    }
    return { angle, order, best };
  });
  const ranked = scored
    .sort((a, b) => compareCandidates(a.best, b.best) || a.order - b.order)
    .map((entry) => entry.angle);
  const top = ranked.slice(0, count);
  if (!top.includes(centre)) top[top.length - 1] = centre;
  return top;
}
