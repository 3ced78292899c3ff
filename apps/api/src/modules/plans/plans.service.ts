// Layout and job previews: the planner validates and plans the request in the planner pool's worker
// threads. Nothing is stored; the plan depends only on the request.
import { LayoutInputError } from '@seamwright/takeoff';
import type { JobPlan, LayoutPlan } from '@seamwright/takeoff';
import { AppError } from '../../errors.js';
import type { PlannerPool } from '../../planner/planner-pool.js';

/** `area.holes[0]` → `area.holes.0`, the dotted form our field errors use. */
function toFieldPath(path: string): string {
  return path.replace(/\[(\d+)\]/g, '.$1');
}

/** The planner's input error as a 422 naming the field (for every route that plans). */
export function layoutInputProblem(error: LayoutInputError): AppError {
  return new AppError('UNPROCESSABLE', error.message, {
    ...(error.path ? { errors: [{ path: toFieldPath(error.path), message: error.detail }] } : {}),
  });
}

export async function previewPlan(pool: PlannerPool, body: unknown): Promise<LayoutPlan> {
  try {
    return await pool.planLayout(body);
  } catch (error) {
    if (error instanceof LayoutInputError) throw layoutInputProblem(error);
    throw error;
  }
}

/** Several areas of one job planned together (plan-job's contract), through the same pool. */
export async function previewJobPlan(pool: PlannerPool, body: unknown): Promise<JobPlan> {
  try {
    return await pool.planJob(body);
  } catch (error) {
    if (error instanceof LayoutInputError) throw layoutInputProblem(error);
    throw error;
  }
}
