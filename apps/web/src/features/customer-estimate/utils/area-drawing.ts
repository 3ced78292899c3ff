import type { PublicEstimateArea } from '@seamwright/shared';
import type { DrawablePlan, PlanWalkway } from '../../../components/plan/plan-drawing';

export interface AreaDrawing {
  plan: DrawablePlan;
  rings: [number, number][][];
  walkways: PlanWalkway[];
}

/**
 * The public view carries the saved plan's drawing fields as plain JSON; an area without an
 * outline or without the lists the drawing needs is shown by its size only.
 */
export function areaDrawingOf(area: PublicEstimateArea): AreaDrawing | null {
  const { plan, outline } = area;
  if (!outline || outline.outer.length < 3) return null;
  if (!Array.isArray(plan.cuts) || !Array.isArray(plan.pieces) || !Array.isArray(plan.seamLines))
    return null;
  if (typeof plan.grainAngleDeg !== 'number') return null;
  const drawable = {
    ...plan,
    areaSqFt: area.areaSqFt,
    orderedSqFt: typeof plan.orderedSqFt === 'number' ? plan.orderedSqFt : area.areaSqFt,
    seams: { count: plan.seamLines.length },
    // The lists were written by the planner and saved with the area (public-estimate-view.ts);
    // their shape is the planner's, checked above as far as the drawing depends on it.
  } as unknown as DrawablePlan;
  return {
    plan: drawable,
    rings: [outline.outer, ...outline.holes],
    walkways: area.trafficPaths,
  };
}
