// Layout preview: validates the request with the planner's own parser and runs the pure
// planner. Nothing is stored; the plan depends only on the request.
import { LayoutInputError, parseLayoutRequest, planLayout } from '@seamwright/takeoff';
import type { LayoutPlan } from '@seamwright/takeoff';
import { AppError } from '../../errors.js';

/** `area.holes[0]` → `area.holes.0`, the dotted form our field errors use. */
function toFieldPath(path: string): string {
  return path.replace(/\[(\d+)\]/g, '.$1');
}

export function previewPlan(body: unknown): LayoutPlan {
  try {
    return planLayout(parseLayoutRequest(body));
  } catch (error) {
    if (error instanceof LayoutInputError) {
      throw new AppError('UNPROCESSABLE', error.message, {
        ...(error.path
          ? { errors: [{ path: toFieldPath(error.path), message: error.detail }] }
          : {}),
      });
    }
    throw error;
  }
}
