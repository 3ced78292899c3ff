import {
  cautionContextForTakeoff,
  cautionsFor,
  computeTakeoff,
  defaultTakeoffSettings,
} from '@seamwright/takeoff';
import type { Caution, LayoutPlan, TakeoffInput, TakeoffLine } from '@seamwright/takeoff';
import type { Usage } from './layout-params';

/** The takeoff's view of a plan: area, perimeter, seams and the pieces bought. */
export function takeoffInputFromPlan(plan: LayoutPlan, usage: Usage): TakeoffInput {
  return {
    usage,
    areaSqFt: plan.areaSqFt,
    perimeterFt: plan.perimeterFt,
    perimeterByTagFt: plan.perimeterByTagFt,
    seams: { sideFt: plan.seams.sideFt, buttFt: plan.seams.buttFt, count: plan.seams.count },
    turf: {
      orderedSqFt: plan.orderedSqFt,
      pieces: plan.pieces.map(({ widthFt, lengthFt }) => ({ widthFt, lengthFt })),
    },
  };
}

export interface PlanTakeoff {
  lines: TakeoffLine[];
  cautions: Caution[];
}

/**
 * The material takeoff and cautions for a plan, on the standard estimating defaults (the
 * company's own settings come with a later issue).
 */
export function takeoffForPlan(plan: LayoutPlan, usage: Usage): PlanTakeoff {
  const input = takeoffInputFromPlan(plan, usage);
  const lines = computeTakeoff(input, defaultTakeoffSettings);
  const cautions = cautionsFor(cautionContextForTakeoff(input, lines, defaultTakeoffSettings));
  return { lines, cautions };
}
