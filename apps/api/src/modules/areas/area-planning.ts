// Plans an area on the server: the chosen plan and its alternatives, every one through the
// planner pool (never on the event loop). The request each plan was made from is kept, so a
// saved plan can be planned again and compared exactly.
import { FACING_DEGREES, LAYOUT_ENGINE_VERSION, LayoutInputError } from '@seamwright/takeoff';
import type { LayoutPlan } from '@seamwright/takeoff';
import type { AreaAlternativeView, AreaGrainChoice, AreaTurfProduct } from '@seamwright/shared';
import { AppError } from '../../errors.js';
import type { PlannerPool } from '../../planner/planner-pool.js';
import { layoutInputProblem } from '../plans/plans.service.js';

/** The planner fields of an area, as the client sent them (the planner validates them). */
export interface AreaPlannerInput {
  area: unknown;
  roll: unknown;
  edges?: unknown;
  holeEdges?: unknown;
  trafficPaths?: unknown;
  lengthStepFt?: unknown;
  trimAllowanceFt?: unknown;
}

export interface PlannedArea {
  request: Record<string, unknown>;
  plan: LayoutPlan & { engineVersion: string };
  alternatives: AreaAlternativeView<LayoutPlan>[];
}

const plannerKeys = [
  'area',
  'edges',
  'holeEdges',
  'trafficPaths',
  'lengthStepFt',
  'trimAllowanceFt',
] as const;

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The roll to plan with: as sent, with the turf product's longest roll filled in when the
 * request gives none, or the product's first width when no roll is sent at all. A width the
 * product does not come in is refused (400 naming `roll.widthFt`).
 */
export function rollFor(roll: unknown, product: AreaTurfProduct | null): unknown {
  if (!product) return roll;
  if (roll === undefined || roll === null)
    return { widthFt: product.rollWidthsFt[0], maxLengthFt: product.maxRollLengthFt };
  if (!isRecord(roll)) return roll;
  if (typeof roll.widthFt === 'number' && !product.rollWidthsFt.includes(roll.widthFt)) {
    const message = `${product.name} comes in ${product.rollWidthsFt.join(' or ')} ft widths`;
    throw new AppError('VALIDATION_FAILED', `roll.widthFt: ${message}`, {
      errors: [{ path: 'roll.widthFt', message }],
    });
  }
  return roll.maxLengthFt === undefined || roll.maxLengthFt === null
    ? { ...roll, maxLengthFt: product.maxRollLengthFt }
    : roll;
}

/** The planner request: the planner fields that were sent, the roll and the grain angle. */
function requestOf(
  input: AreaPlannerInput,
  roll: unknown,
  angleDeg: number | null,
): Record<string, unknown> {
  const request: Record<string, unknown> = {};
  for (const key of plannerKeys)
    if (input[key] !== undefined && input[key] !== null) request[key] = input[key];
  request.roll = roll;
  if (angleDeg !== null) request.grain = { angleDeg };
  return request;
}

function withoutGrain(request: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(request).filter(([key]) => key !== 'grain'));
}

function withWidth(request: Record<string, unknown>, widthFt: number): Record<string, unknown> {
  return { ...request, roll: { ...(request.roll as Record<string, unknown>), widthFt } };
}

async function plan(pool: PlannerPool, request: Record<string, unknown>): Promise<LayoutPlan> {
  try {
    return await pool.planLayout(request);
  } catch (error) {
    if (error instanceof LayoutInputError) throw layoutInputProblem(error);
    throw error;
  }
}

/** An alternative that cannot be planned (too narrow a roll, too much work) is left out. */
async function planOptional(
  pool: PlannerPool,
  request: Record<string, unknown>,
): Promise<LayoutPlan | null> {
  try {
    return await pool.planLayout(request);
  } catch (error) {
    if (error instanceof LayoutInputError) return null;
    if (error instanceof AppError && error.code === 'UNPROCESSABLE') return null;
    throw error;
  }
}

/**
 * The facing direction turned at most `toleranceDeg` to save turf, as the job planner finds
 * it (packages/takeoff, grain-facing.ts); the exact facing when no turn is allowed.
 */
async function facingAngle(
  pool: PlannerPool,
  request: Record<string, unknown>,
  choice: Extract<AreaGrainChoice, { kind: 'facing' }>,
): Promise<number> {
  const centre = FACING_DEGREES[choice.facing];
  if (choice.toleranceDeg === 0) return centre;
  const { roll, lengthStepFt, ...area } = withoutGrain(request);
  const job = await pool.planJob({
    areas: [
      { id: 'area', ...area, grain: { facing: choice.facing, toleranceDeg: choice.toleranceDeg } },
    ],
    rolls: [roll],
    ...(lengthStepFt === undefined ? {} : { lengthStepFt }),
  });
  return job.areas[0]?.grainAngleDeg ?? centre;
}

function walkwaySeamFt(p: LayoutPlan): number {
  return Math.round(p.trafficSeamCrossings.reduce((sum, c) => sum + c.lengthFt, 0) * 100) / 100;
}

function sameLayout(a: LayoutPlan, b: LayoutPlan): boolean {
  return (
    a.grainAngleDeg === b.grainAngleDeg &&
    a.orderedSqFt === b.orderedSqFt &&
    a.seams.count === b.seams.count &&
    a.pieces.length === b.pieces.length
  );
}

const labels: Record<AreaAlternativeView['kind'], string> = {
  chosen: 'As chosen',
  cheapest: 'Least turf',
  turned: 'Turned a quarter turn',
  'other-width': 'Other roll width',
};

function alternativeOf(
  kind: AreaAlternativeView['kind'],
  p: LayoutPlan,
  chosen: LayoutPlan,
  rollWidthFt: number,
): AreaAlternativeView<LayoutPlan> {
  return {
    kind,
    label: labels[kind],
    rollWidthFt,
    grainAngleDeg: p.grainAngleDeg,
    orderedSqFt: p.orderedSqFt,
    wastePct: p.wastePct,
    seamCount: p.seams.count,
    seamFt: Math.round((p.seams.sideFt + p.seams.buttFt) * 100) / 100,
    walkwaySeamFt: walkwaySeamFt(p),
    sameAsChosen: kind !== 'chosen' && sameLayout(p, chosen),
    plan: p,
  };
}

/**
 * Plans an area: validates the geometry (422 naming the field), resolves the grain choice to
 * a direction, plans it, then the alternatives — the cheapest direction (or, when the cheapest
 * was chosen, the direction a quarter turn from it) and every other width the turf product
 * comes in, with the same grain rule.
 */
export async function planArea(
  pool: PlannerPool,
  input: AreaPlannerInput,
  choice: AreaGrainChoice,
  product: AreaTurfProduct | null,
): Promise<PlannedArea> {
  const roll = rollFor(input.roll, product);
  const fixed =
    choice.kind === 'angle'
      ? choice.angleDeg
      : choice.kind === 'facing'
        ? FACING_DEGREES[choice.facing]
        : null;
  let request = requestOf(input, roll, fixed);
  let chosen = await plan(pool, request);
  if (choice.kind === 'facing' && choice.toleranceDeg > 0) {
    const angle = await facingAngle(pool, request, choice);
    if (angle !== fixed) {
      request = requestOf(input, roll, angle);
      chosen = await plan(pool, request);
    }
  }
  const widthFt = (request.roll as { widthFt: number }).widthFt;
  const alternatives = [alternativeOf('chosen', chosen, chosen, widthFt)];
  const second =
    choice.kind === 'cheapest'
      ? { kind: 'turned' as const, grain: { angleDeg: (chosen.grainAngleDeg + 90) % 360 } }
      : { kind: 'cheapest' as const, grain: undefined };
  const free = withoutGrain(request);
  const secondPlan = await planOptional(
    pool,
    second.grain ? { ...free, grain: second.grain } : free,
  );
  if (secondPlan) alternatives.push(alternativeOf(second.kind, secondPlan, chosen, widthFt));
  for (const width of product?.rollWidthsFt ?? []) {
    if (width === widthFt) continue;
    const other = await planOptional(pool, withWidth(request, width));
    if (other) alternatives.push(alternativeOf('other-width', other, chosen, width));
  }
  return {
    request,
    plan: { ...chosen, engineVersion: LAYOUT_ENGINE_VERSION },
    alternatives,
  };
}
