import { boundingBoxOf } from './measure';
import type { Pt } from './types';

/** What part of the yard the drawing shows: its centre and width in feet (height by aspect). */
export interface View {
  readonly cx: number;
  readonly cy: number;
  readonly widthFt: number;
}

export const MIN_VIEW_FT = 4;
export const MAX_VIEW_FT = 2000;

const clampWidth = (width: number) => Math.min(MAX_VIEW_FT, Math.max(MIN_VIEW_FT, width));

/** The view that shows every point with a margin, for a drawing `aspect` (height ÷ width). */
export function fitView(points: readonly Pt[], aspect: number): View {
  if (points.length === 0) return { cx: 15, cy: 10, widthFt: 50 };
  const box = boundingBoxOf(points);
  const width = Math.max(box.maxX - box.minX, (box.maxY - box.minY) / aspect, 1);
  return {
    cx: (box.minX + box.maxX) / 2,
    cy: (box.minY + box.maxY) / 2,
    widthFt: clampWidth(width * 1.3),
  };
}

/** Zooms by `factor` (above 1 zooms in), keeping `anchor` (a yard point) where it is on screen. */
export function zoomView(view: View, factor: number, anchor: Pt = [view.cx, view.cy]): View {
  const widthFt = clampWidth(view.widthFt / factor);
  const kept = widthFt / view.widthFt;
  return {
    widthFt,
    cx: anchor[0] + (view.cx - anchor[0]) * kept,
    cy: anchor[1] + (view.cy - anchor[1]) * kept,
  };
}

/** Moves the view by a share of its width (keyboard panning) or by feet. */
export function panView(view: View, dxFt: number, dyFt: number): View {
  return { ...view, cx: view.cx + dxFt, cy: view.cy + dyFt };
}

/** A grid step that draws between about 8 and 80 lines across the view. */
export function gridStepFor(view: View, snapFt: number | null): number {
  const steps = [0.5, 1, 2, 5, 10, 25, 50, 100, 250];
  const base = snapFt ?? 1;
  return steps.find((step) => step >= base && view.widthFt / step <= 80) ?? 250;
}
