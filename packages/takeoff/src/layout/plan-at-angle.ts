import type { Capsule } from '../geometry/traffic.js';
import { clipParts } from './clip-parts.js';
import type { ClippedPart } from './clip-parts.js';
import { maxUnitsFor } from './cuts.js';
import type { CutRules } from './cuts.js';
import { compareCandidates, evaluateParts } from './evaluate-offset.js';
import type { AngleContext, LayoutCandidate } from './evaluate-offset.js';
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
  /** Fewest steps bought by a simple strip layout among the rebuilt offsets. */
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
 * Final layout for one direction: the best few offsets from the fast screen are rebuilt with
 * polygon clipping, and the best rebuilt one wins (ties keep the screen's order).
 */
export function finishAngle(context: AngleContext, screened: readonly LayoutCandidate[]): AngleLayout {
  let best: AngleLayout | null = null;
  let simpleUnits = Infinity;
  for (const fast of screened.slice(0, FINAL_OFFSETS)) {
    const clipped = clipParts(context.polygon, fast.lines);
    const candidate = evaluateParts(context, fast.offset, fast.lines, clipped, fast.sideSeams);
    simpleUnits = Math.min(simpleUnits, candidate.simpleUnits);
    if (!best || compareCandidates(candidate, best.candidate) < 0) best = { context, candidate, clipped, simpleUnits: 0 };
  }
  if (!best) throw new Error('no strip offset was evaluated');
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
