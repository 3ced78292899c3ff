import { normalizeDegrees } from '../geometry/grain-frame.js';
import { walkwayCapsules } from '../geometry/traffic.js';
import { cutSheetOf } from './cut-sheet.js';
import { roundDirection, searchDirections } from './direction-search.js';
import { parseLayoutRequest } from './parse-request.js';
import { netArea, perimeters } from './perimeter.js';
import { piecesAndCuts } from './pieces.js';
import { planAtAngle } from './plan-at-angle.js';
import type { AngleLayout } from './plan-at-angle.js';
import { roundFt, roundSqFt } from './rounding.js';
import { seamLinesOf, trafficCrossings } from './seam-lines.js';
import type { LayoutAlternative, LayoutPlan, LayoutRequest, LayoutRequestInput } from './types.js';

function orderedSqFt(layout: AngleLayout, units: number): number {
  return roundSqFt(units * layout.context.rules.stepFt * layout.context.rules.widthFt);
}

function alternativeOf(layout: AngleLayout, grainAngleDeg: number): LayoutAlternative {
  return {
    grainAngleDeg,
    orderedSqFt: orderedSqFt(layout, layout.candidate.orderedUnits),
    seamCount: layout.candidate.seamCount,
  };
}

/**
 * Plans the turf for one area: which full-width pieces to buy, where each cut goes, the
 * seams, perimeter and waste. Pure and deterministic. With `grain` given the layout runs
 * that way; without it the planner picks the direction that buys the least turf (ties:
 * fewer seam feet in walkways, then fewer seams). Validates its input like
 * {@link parseLayoutRequest} and throws `LayoutInputError` on bad geometry.
 */
export function planLayout(input: LayoutRequestInput | LayoutRequest): LayoutPlan {
  const request: LayoutRequest = parseLayoutRequest(input);
  const walkways = request.trafficPaths.map((path) => walkwayCapsules(path.points, path.widthFt));
  let chosen: AngleLayout;
  let grainAngleDeg: number;
  let alternatives: LayoutAlternative[];
  if (request.grain) {
    grainAngleDeg = roundFt(normalizeDegrees(request.grain.angleDeg));
    chosen = planAtAngle(request, grainAngleDeg, walkways);
    const across = roundDirection(grainAngleDeg + 90);
    alternatives = [alternativeOf(planAtAngle(request, across, walkways), across)];
  } else {
    const search = searchDirections(request, walkways);
    chosen = search.winner;
    grainAngleDeg = chosen.context.polygon.frame.angleDeg;
    const { stepFt, widthFt } = chosen.context.rules;
    alternatives = search.others.map(({ angle, score }) => ({
      grainAngleDeg: angle,
      orderedSqFt: roundSqFt(score.orderedUnits * stepFt * widthFt),
      seamCount: score.seamCount,
    }));
  }
  const { pieces, cuts } = piecesAndCuts(chosen);
  const seamLines = seamLinesOf(chosen);
  const areaSqFt = netArea(request);
  const ordered = orderedSqFt(chosen, chosen.candidate.orderedUnits);
  const perimeter = perimeters(request);
  const sideFt = seamLines.filter((s) => s.kind === 'side').reduce((sum, s) => sum + s.lengthFt, 0);
  const buttFt = seamLines.filter((s) => s.kind === 'butt').reduce((sum, s) => sum + s.lengthFt, 0);
  return {
    areaSqFt: roundSqFt(areaSqFt),
    orderedSqFt: ordered,
    grainAngleDeg,
    grainSource: request.grain ? 'given' : 'planner',
    pieces,
    cuts,
    seams: { count: seamLines.length, sideFt: roundFt(sideFt), buttFt: roundFt(buttFt) },
    seamLines,
    perimeterFt: roundSqFt(perimeter.total),
    perimeterByTagFt: perimeter.byTag,
    excessSqFt: roundSqFt(ordered - areaSqFt),
    wastePct: roundSqFt(((ordered - areaSqFt) / ordered) * 100),
    simpleStripOrderedSqFt: orderedSqFt(chosen, chosen.simpleUnits),
    offcutReuse: chosen.candidate.packing !== null,
    trafficSeamCrossings: trafficCrossings(seamLines, walkways),
    cutSheet: cutSheetOf(chosen, pieces, cuts, request.area.outer, grainAngleDeg),
    alternatives,
  };
}
