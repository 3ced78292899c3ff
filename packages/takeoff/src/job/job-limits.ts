import { LayoutInputError } from '../layout/errors.js';
import { MAX_TOTAL_VERTICES, checkLayoutRequestSize } from '../layout/limits.js';
import { requireArray, requireRecord } from '../layout/read-fields.js';

/** Most areas in one job. */
export const MAX_JOB_AREAS = 20;
/** Most roll widths one job may offer (each multiplies the planning work). */
export const MAX_JOB_ROLLS = 6;
/** Most remnants one job may list. */
export const MAX_JOB_REMNANTS = 100;

function arrayLength(value: unknown): number {
  return Array.isArray(value) ? value.length : 0;
}

/** Points of one area's rings, read from array lengths only. */
function areaPointCount(area: Record<string, unknown>): number {
  const rings = area.area;
  if (typeof rings !== 'object' || rings === null) return 0;
  const { outer, holes } = rings as { outer?: unknown; holes?: unknown };
  const holeList = Array.isArray(holes) ? holes : [];
  return arrayLength(outer) + holeList.reduce<number>((sum, hole) => sum + arrayLength(hole), 0);
}

/**
 * The job request's size checks, as cheap as the single-area ones (array lengths only), so
 * the API can refuse an oversize job on its own thread before a planner worker sees it, with
 * the same message the plan-job command gives: the number of areas, rolls and remnants, each
 * area's single-area limits (paths `areas[i].…`), and all areas' points together.
 */
export function checkJobRequestSize(json: unknown): void {
  const body = requireRecord('request', json);
  const areas = requireArray('areas', body.areas);
  if (areas.length > MAX_JOB_AREAS)
    throw new LayoutInputError('areas', `must have at most ${MAX_JOB_AREAS} areas`);
  if (arrayLength(body.rolls) > MAX_JOB_ROLLS)
    throw new LayoutInputError('rolls', `must have at most ${MAX_JOB_ROLLS} rolls`);
  if (arrayLength(body.remnants) > MAX_JOB_REMNANTS)
    throw new LayoutInputError('remnants', `must have at most ${MAX_JOB_REMNANTS} remnants`);
  let points = 0;
  areas.forEach((item, i) => {
    const area = requireRecord(`areas[${i}]`, item);
    try {
      checkLayoutRequestSize(area);
    } catch (error) {
      if (!(error instanceof LayoutInputError)) throw error;
      const path = error.path === 'request' ? `areas[${i}]` : `areas[${i}].${error.path}`;
      throw new LayoutInputError(path, error.detail);
    }
    points += areaPointCount(area);
  });
  if (points > MAX_TOTAL_VERTICES)
    throw new LayoutInputError(
      'areas',
      `must have at most ${MAX_TOTAL_VERTICES} points in all (they have ${points})`,
    );
}
