// The underlay as the editor draws it: the saved view plus what is being changed on screen.
import { pixelDistance, underlayFeetToPixel } from '@seamwright/shared';
import type { AreaUnderlayView, PixelPoint, UnderlayPlacement } from '@seamwright/shared';
import { boundingBoxOf } from './measure';
import type { Pt } from './types';

export interface UnderlayDrawing {
  href: string;
  widthPx: number;
  heightPx: number;
  placement: UnderlayPlacement;
  opacity: number;
  /** The two scale points being picked or saved, in image pixels. */
  marks: PixelPoint[];
}

/**
 * Until a scale is set the image is drawn as wide as the drawing (at least 20 ft), so it can
 * be seen and two points picked on it; the pixels picked do not depend on this guess.
 */
export function provisionalFeetPerPixel(widthPx: number, points: readonly Pt[]): number {
  const box = points.length ? boundingBoxOf(points) : null;
  const widthFt = Math.max(box ? box.maxX - box.minX : 0, 20);
  return widthFt / Math.max(widthPx, 1);
}

export function placementOf(
  view: AreaUnderlayView,
  local: { offsetFt: { x: number; y: number }; rotationDeg: number },
  points: readonly Pt[],
): UnderlayPlacement {
  return {
    feetPerPixel: view.feetPerPixel ?? provisionalFeetPerPixel(view.widthPx, points),
    offsetFt: local.offsetFt,
    rotationDeg: local.rotationDeg,
  };
}

/** The image pixel under a drawing point, or null when the point is off the image. */
export function pixelOnImage(
  drawing: Pick<UnderlayDrawing, 'placement' | 'widthPx' | 'heightPx'>,
  point: Pt,
): PixelPoint | null {
  const p = underlayFeetToPixel(drawing.placement, { x: point[0], y: point[1] });
  if (p.x < 0 || p.y < 0 || p.x > drawing.widthPx || p.y > drawing.heightPx) return null;
  return { x: Math.round(p.x), y: Math.round(p.y) };
}

export function pointsDistinct(a: PixelPoint | null, b: PixelPoint | null): boolean {
  return a !== null && b !== null && pixelDistance(a, b) >= 1;
}
