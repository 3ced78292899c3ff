// What a new area saves: its turf product snapshot, grain choice, the planner input as sent and
// the plan with its alternatives. Shared by the areas service and the demo seed, so demo areas
// are planned exactly as a request's are.
import { toGrainChoice } from '@seamwright/shared';
import type { CreateAreaData } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import type { PlannerPool } from '../../planner/planner-pool.js';
import { planArea } from './area-planning.js';
import type { AreaPlannerInput } from './area-planning.js';
import { turfProductFor } from './area-rules.js';
import type { AreaValues } from './areas.repository.js';

export const plannerKeys = [
  'area',
  'roll',
  'edges',
  'holeEdges',
  'trafficPaths',
  'lengthStepFt',
  'trimAllowanceFt',
] as const;

/** The planner fields sent, without the ones left out (so the stored input stays plain JSON). */
export function plannerInputOf(input: Partial<AreaPlannerInput>): AreaPlannerInput {
  const out: Record<string, unknown> = {};
  for (const key of plannerKeys) if (input[key] !== undefined) out[key] = input[key];
  return out as unknown as AreaPlannerInput;
}

/**
 * Plans a new area through the pool and returns its row values. Requests plan before their
 * transaction opens; the demo seed passes its own `tx`, as its price book is not committed yet.
 */
export async function planNewArea(
  ctx: RequestContext,
  plannerPool: PlannerPool,
  input: CreateAreaData,
  tx?: Tx,
): Promise<AreaValues> {
  const product = await turfProductFor(ctx, input.turfProductId, tx);
  const grainChoice = toGrainChoice(input.grain);
  const plannerInput = plannerInputOf(input);
  const planned = await planArea(plannerPool, plannerInput, grainChoice, product);
  return {
    name: input.name,
    usage: input.usage,
    turfProductId: product?.id ?? null,
    turfProduct: product,
    baseDepthIn: input.baseDepthIn ?? null,
    grainChoice,
    input: plannerInput,
    request: planned.request,
    plan: planned.plan,
    alternatives: planned.alternatives,
    engineVersion: planned.plan.engineVersion,
    areaSqFt: planned.plan.areaSqFt,
    orderedSqFt: planned.plan.orderedSqFt,
  };
}
