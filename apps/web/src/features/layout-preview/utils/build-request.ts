import type { EdgeTag, LayoutPoint, LayoutRequestInput } from '@seamwright/takeoff';
import { sameTagForAll, tagsInRingOrder } from './edge-tags';
import type { LayoutParams } from './layout-params';
import { unitsFor, type Units } from '../../../lib/units';
import { readAngle, readLength, readPoint } from './read-input';
import {
  buildFromPoints,
  buildLShape,
  buildRectangle,
  lShapeEdges,
  rectangleEdges,
  type FieldErrors,
  type ShapeResult,
} from './shape-builders';

/** Grain angles (degrees CCW from east, the direction the roll's length runs) for the compass choices. */
export const grainAngles = { 'east-west': 0, 'north-south': 90 } as const;

function shapeOf(params: LayoutParams, units: Units): ShapeResult {
  if (params.shape === 'rectangle') return buildRectangle(params.len, params.wid, units);
  if (params.shape === 'l-shape')
    return buildLShape(params.len, params.wid, params.nlen, params.nwid, units);
  return buildFromPoints(params.pts, units);
}

/** The outer ring's edge tags in ring order, as the planner's `edges` expects; undefined when none. */
function edgesOf(params: LayoutParams, ringLength: number): (EdgeTag | null)[] | undefined {
  if (params.shape === 'rectangle')
    return tagsInRingOrder(rectangleEdges, params.redges, ringLength);
  if (params.shape === 'l-shape') return tagsInRingOrder(lShapeEdges, params.ledges, ringLength);
  return sameTagForAll(params.pedge, ringLength);
}

function trafficPathOf(
  params: LayoutParams,
  errors: FieldErrors,
  units: Units,
): LayoutPoint[] | undefined {
  if (params.from.trim() === '' && params.to.trim() === '') return undefined;
  const from = readPoint(params.from, units);
  const to = readPoint(params.to, units);
  if (!from.ok)
    errors.from =
      params.from.trim() === '' ? 'Give where the path starts, or clear both ends' : from.message;
  if (!to.ok)
    errors.to =
      params.to.trim() === '' ? 'Give where the path ends, or clear both ends' : to.message;
  if (!from.ok || !to.ok) return undefined;
  return [from.value, to.value];
}

/** What the typed fields make: a planner request when every field reads, and the messages of those that do not. */
export interface BuiltRequest {
  request: LayoutRequestInput | null;
  errors: FieldErrors;
}

/**
 * Turns the screen's fields into a layout request for `planLayout`. The fields are read in the
 * company's units; the request is always in feet.
 */
export function buildLayoutRequest(
  params: LayoutParams,
  units: Units = unitsFor('imperial'),
): BuiltRequest {
  const shape = shapeOf(params, units);
  const errors: FieldErrors = shape.ok ? {} : { ...shape.errors };
  const maxLength = readLength(params.max, units);
  if (!maxLength.ok) errors.max = maxLength.message;
  else if (maxLength.value < 1)
    errors.max = `The longest piece must be at least ${units.length(1)}`;
  let angleDeg: number | undefined;
  if (params.grain === 'angle') {
    const angle = readAngle(params.angle);
    if (angle.ok) angleDeg = angle.value;
    else errors.angle = angle.message;
  } else if (params.grain !== 'auto') {
    angleDeg = grainAngles[params.grain];
  }
  const path = trafficPathOf(params, errors, units);
  if (!shape.ok || Object.keys(errors).length > 0 || !maxLength.ok)
    return { request: null, errors };
  const edges = edgesOf(params, shape.outer.length);
  return {
    request: {
      area: { outer: shape.outer, holes: shape.holes },
      roll: { widthFt: params.roll, maxLengthFt: maxLength.value },
      grain: angleDeg === undefined ? null : { angleDeg },
      ...(path ? { trafficPaths: [path] } : {}),
      ...(edges ? { edges } : {}),
    },
    errors,
  };
}
