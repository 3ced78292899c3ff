import { planLayout } from '@seamwright/takeoff';
import type { LayoutPlan, LayoutPoint } from '@seamwright/takeoff';
import { unitsFor, type Units } from '../../../lib/units';
import type { LayoutParams } from './layout-params';
import { buildLayoutRequest } from './build-request';
import { plannerMessage } from './planner-message';
import { takeoffForPlan, type PlanTakeoff } from './plan-takeoff';

/** A plan with its takeoff, for the params it was computed from. */
export interface GoodPlan {
  plan: LayoutPlan;
  takeoff: PlanTakeoff | null;
  params: LayoutParams;
  /** The units the params were read in; a change of units plans again. */
  units: Units;
  /** The outline it was planned for: outer ring, then holes. */
  rings: LayoutPoint[][];
  walkway: LayoutPoint[] | null;
}

/** The screen's plan state: the last plan that worked, and why the current input does not make one. */
export interface PlanState {
  good: GoodPlan | null;
  /** The planner's message when it refused the current input. */
  plannerError: string | null;
  /** The fields do not read, so the plan shown is from earlier input. */
  isFieldInvalid: boolean;
}

export const emptyPlanState: PlanState = { good: null, plannerError: null, isFieldInvalid: false };

/**
 * Plans the typed input, keeping the previous good plan when the fields do not read or the
 * planner refuses the shape. planLayout is synchronous and fast (well under 50 ms for 60
 * vertices), so it runs on the main thread.
 */
export function computePlanState(
  params: LayoutParams,
  previous: PlanState,
  units: Units = unitsFor('imperial'),
): PlanState {
  const { request } = buildLayoutRequest(params, units);
  if (!request) return { good: previous.good, plannerError: null, isFieldInvalid: true };
  try {
    const plan = planLayout(request);
    let takeoff: PlanTakeoff | null = null;
    try {
      takeoff = takeoffForPlan(plan, params.use);
    } catch {
      takeoff = null; // the plan still stands; the takeoff panel says it could not be worked out
    }
    const rings = [request.area.outer, ...(request.area.holes ?? [])].map((ring) => [...ring]);
    const walkway = request.trafficPaths?.[0];
    const walkwayPoints = walkway ? [...('points' in walkway ? walkway.points : walkway)] : null;
    return {
      good: { plan, takeoff, params, units, rings, walkway: walkwayPoints },
      plannerError: null,
      isFieldInvalid: false,
    };
  } catch (error) {
    return { good: previous.good, plannerError: plannerMessage(error), isFieldInvalid: false };
  }
}
