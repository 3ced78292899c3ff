import { feetToMetres, metresToFeet } from '@seamwright/takeoff';
import type { LayoutPlan, LayoutPoint } from '@seamwright/takeoff';

/** Maps plan feet (x east, y north) onto SVG units (y down): one SVG unit is one foot. */
export interface DrawingFrame {
  /** Whole drawing, for the viewBox. */
  width: number;
  height: number;
  /** Height of the strip under the plan that carries the scale bar and north arrow. */
  footer: number;
  margin: number;
  /** A size that reads well at this scale (label height, arrow length), in feet. */
  unit: number;
  /** Plan width in feet, for the scale bar. */
  planWidth: number;
  toSvg: (point: LayoutPoint) => LayoutPoint;
}

/** A frame around every point the drawing shows: the area, the cuts (which may run past it) and any walkway. */
export function drawingFrame(
  plan: Pick<LayoutPlan, 'cuts'>,
  rings: readonly (readonly LayoutPoint[])[],
  extra: readonly LayoutPoint[],
): DrawingFrame {
  const points = [...rings.flat(), ...plan.cuts.flatMap((cut) => cut.corners), ...extra];
  const xs = points.map(([x]) => x);
  const ys = points.map(([, y]) => y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const planWidth = Math.max(maxX - minX, 1e-6);
  const planHeight = Math.max(maxY - minY, 1e-6);
  const unit = Math.max(planWidth, planHeight) / 40;
  const margin = unit * 2;
  const footer = unit * 7;
  return {
    width: planWidth + 2 * margin,
    height: planHeight + 2 * margin + footer,
    footer,
    margin,
    unit,
    planWidth,
    // The SVG y axis points down; north is up, so y is flipped here and only here.
    toSvg: ([x, y]) => [x - minX + margin, maxY - y + margin],
  };
}

/** An SVG path through the rings (closed), for outlines and the even-odd clip of the area. */
export function ringsPath(
  rings: readonly (readonly LayoutPoint[])[],
  toSvg: DrawingFrame['toSvg'],
): string {
  return rings
    .map(
      (ring) =>
        `M${ring
          .map((point) =>
            toSvg(point)
              .map((v) => v.toFixed(3))
              .join(' '),
          )
          .join('L')}Z`,
    )
    .join('');
}

const niceLengths = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000];
const niceMetres = [0.5, 1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500];

/** A round scale-bar length no longer than about a third of the plan's width. */
export function scaleBarFeet(planWidth: number): number {
  const target = planWidth / 3;
  return niceLengths.filter((length) => length <= target).at(-1) ?? niceLengths[0] ?? 1;
}

/** The scale bar for a metric company: a round number of metres, and its length in plan feet. */
export function scaleBarMetres(planWidth: number): { metres: number; feet: number } {
  const target = feetToMetres(planWidth) / 3;
  const metres = niceMetres.filter((length) => length <= target).at(-1) ?? niceMetres[0] ?? 1;
  return { metres, feet: metresToFeet(metres) };
}
