// What a new area saves: its turf product snapshot, grain choice, the planner input as sent and
// the plan with its alternatives. Shared by the areas service and the demo seed, so demo areas
// are planned exactly as a request's are.
import { toGrainChoice } from '@seamwright/shared';
import type { AreaGrainChoice, AreaTurfProduct, CreateAreaData } from '@seamwright/shared';
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

/** What planning decides of an area: its product, grain, planner input and plans. */
export type PlannedValues = Pick<
  AreaValues,
  | 'turfProductId'
  | 'turfProduct'
  | 'grainChoice'
  | 'input'
  | 'request'
  | 'plan'
  | 'alternatives'
  | 'engineVersion'
  | 'areaSqFt'
  | 'orderedSqFt'
>;

/** Plans an area through the pool and returns the row values the plan decides. */
export async function planValues(
  plannerPool: PlannerPool,
  product: AreaTurfProduct | null,
  grainChoice: AreaGrainChoice,
  plannerInput: AreaPlannerInput,
): Promise<PlannedValues> {
  const planned = await planArea(plannerPool, plannerInput, grainChoice, product);
  return {
    turfProductId: product?.id ?? null,
    turfProduct: product,
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
  const planned = await planValues(
    plannerPool,
    product,
    toGrainChoice(input.grain),
    plannerInputOf(input),
  );
  return {
    name: input.name,
    usage: input.usage,
    baseDepthIn: input.baseDepthIn ?? null,
    ...planned,
  };
}
