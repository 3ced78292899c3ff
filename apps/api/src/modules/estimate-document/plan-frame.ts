// Fits a plan (feet, x east, y north) into a box on the page (points, y down), north up,
// and picks a round scale-bar length. One foot is `scale` points in both directions.
import { feetToMetres, metresToFeet } from '@seamwright/takeoff';
import type { LayoutPoint } from '@seamwright/takeoff';

export type PagePoint = [number, number];

export interface PlanFrame {
  /** Points per foot. */
  readonly scale: number;
  /** The plan's own box on the page (the drawing, without labels around it). */
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  /** Plan width in feet, for the scale bar. */
  readonly planWidthFt: number;
  readonly toPage: (point: LayoutPoint) => PagePoint;
}

/**
 * The largest scale at which every point fits in `box`, less `inset` on each side (room for
 * the edge lengths printed outside the outline), centred across the box.
 */
export function fitPlan(
  points: readonly LayoutPoint[],
  box: { x: number; y: number; width: number; maxHeight: number },
  inset: number,
): PlanFrame {
  const xs = points.map(([x]) => x);
  const ys = points.map(([, y]) => y);
  const minX = Math.min(...xs);
  const maxY = Math.max(...ys);
  const planWidthFt = Math.max(Math.max(...xs) - minX, 1e-6);
  const planHeightFt = Math.max(maxY - Math.min(...ys), 1e-6);
  const scale = Math.min(
    (box.width - 2 * inset) / planWidthFt,
    (box.maxHeight - 2 * inset) / planHeightFt,
  );
  const width = planWidthFt * scale;
  const height = planHeightFt * scale;
  const x = box.x + (box.width - width) / 2;
  const y = box.y + inset;
  return {
    scale,
    x,
    y,
    width,
    height,
    planWidthFt,
    // The page's y axis points down; north is up, so y is flipped here and only here.
    toPage: ([px, py]) => [x + (px - minX) * scale, y + (maxY - py) * scale],
  };
}

const niceFeet = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000];
const niceMetres = [0.5, 1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500];

/** A round scale-bar length of about a quarter of the plan's width, in feet (and its label value). */
export function scaleBarLength(
  planWidthFt: number,
  units: 'imperial' | 'metric',
): { feet: number; metres: number | null } {
  if (units === 'metric') {
    const target = feetToMetres(planWidthFt) / 4;
    const metres = niceMetres.filter((m) => m <= target).at(-1) ?? niceMetres[0] ?? 1;
    return { feet: metresToFeet(metres), metres };
  }
  const target = planWidthFt / 4;
  return { feet: niceFeet.filter((f) => f <= target).at(-1) ?? niceFeet[0] ?? 1, metres: null };
}

/** Every point the drawing must show: the outline, the cuts (which may run past it), walkways. */
export function planPoints(
  rings: readonly (readonly LayoutPoint[])[],
  cuts: readonly { corners: readonly LayoutPoint[] }[],
  paths: readonly { points: readonly LayoutPoint[] }[],
): LayoutPoint[] {
  return [
    ...rings.flat(),
    ...cuts.flatMap((cut) => cut.corners),
    ...paths.flatMap((p) => p.points),
  ];
}
