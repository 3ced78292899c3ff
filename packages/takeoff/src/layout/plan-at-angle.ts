import type { Capsule } from '../geometry/traffic.js';
import { clipParts } from './clip-parts.js';
import type { ClippedPart } from './clip-parts.js';
import { maxUnitsFor } from './cuts.js';
import type { CutRules } from './cuts.js';
import { scanBands } from './band-scan.js';
import { boundaryLines, compareCandidates, evaluateParts } from './evaluate-offset.js';
import type { AngleContext, LayoutCandidate } from './evaluate-offset.js';
import type { OffsetScore } from './score-offset.js';
import { toFramePolygon } from './frame-polygon.js';
import { searchOffsets } from './offset-search.js';
import type { LayoutRequest } from './types.js';

/** How many of the best offsets per direction are rebuilt with polygon clipping. */
const FINAL_OFFSETS = 2;

/** The chosen layout for one direction, built from clipped parts. */
export interface AngleLayout {
  readonly context: AngleContext;
  readonly candidate: LayoutCandidate;
  readonly clipped: ClippedPart[];
  /** Fewest steps bought by a simple strip layout over all offsets tried. */
  readonly simpleUnits: number;
}

/** The cut rules of a request. */
export function cutRules(request: LayoutRequest): CutRules {
  return {
    widthFt: request.roll.widthFt,
    stepFt: request.lengthStepFt,
    maxUnits: maxUnitsFor(request.roll.maxLengthFt, request.lengthStepFt),
    trimFt: request.trimAllowanceFt,
  };
}

/** Context for one direction (the geometry is the same for θ and θ + 180°). */
export function angleContext(
  request: LayoutRequest,
  angleDeg: number,
  walkways: readonly (readonly Capsule[])[],
): AngleContext {
  const polygon = toFramePolygon(angleDeg % 180, request.area.outer, request.area.holes);
  return { polygon, rules: cutRules(request), walkways };
}

/**
 * Final layout for one direction: the best offset from the fast screen is rebuilt with
 * polygon clipping. The scan is exact, so the rebuilt figures normally match; if they do
 * not (a degenerate touch the two methods see differently), the next offsets are rebuilt
 * too and the best rebuilt one wins (ties keep the screen's order).
 */
export function finishAngle(context: AngleContext, screened: readonly OffsetScore[]): AngleLayout {
  let best: AngleLayout | null = null;
  let simpleUnits = Infinity;
  const simplest = screened.reduce<OffsetScore | null>(
    (a, b) => (!a || b.simpleUnits < a.simpleUnits ? b : a),
    null,
  );
  const rebuild = (fast: OffsetScore): AngleLayout => {
    const lines = boundaryLines(context.polygon, context.rules.widthFt, fast.offset);
    const clipped = clipParts(context.polygon, lines);
    const { sideSeams } = scanBands(context.polygon, lines);
    const candidate = evaluateParts(context, fast.offset, lines, clipped, sideSeams);
    simpleUnits = Math.min(simpleUnits, candidate.simpleUnits);
    return { context, candidate, clipped, simpleUnits: 0 };
  };
  for (const fast of screened.slice(0, FINAL_OFFSETS)) {
    const layout = rebuild(fast);
    if (!best || compareCandidates(layout.candidate, best.candidate) < 0) best = layout;
    if (compareCandidates(layout.candidate, fast) === 0) break;
  }
  // The guarantee: never more than the best simple strip layout. The screen ensures it;
  // should the rebuild disagree, the simplest layout is rebuilt and competes as well.
  if (best && simplest && best.candidate.orderedUnits > simplest.simpleUnits) {
    const layout = rebuild(simplest);
    if (compareCandidates(layout.candidate, best.candidate) < 0) best = layout;
  }
  if (!best) throw new Error('no strip offset was evaluated');
  simpleUnits = Math.min(simpleUnits, simplest?.simpleUnits ?? Infinity);
  return { ...best, simpleUnits };
}

/** Plans one given direction: screen offsets, then rebuild the best. */
export function planAtAngle(
  request: LayoutRequest,
  angleDeg: number,
  walkways: readonly (readonly Capsule[])[],
): AngleLayout {
  const context = angleContext(request, angleDeg, walkways);
  return finishAngle(context, searchOffsets(context));
}
