import type { LayoutCut, LayoutPlan, Point } from './types.js';

/** Shared checks for the layout tests (not part of the package's public surface). */

/** Is the point inside the cut rectangle (tolerance in feet)? */
export function isInCut(point: Point, cut: LayoutCut, tolerance = 1e-3): boolean {
  const [a, b, , d] = cut.corners;
  const ex: Point = [b[0] - a[0], b[1] - a[1]];
  const ey: Point = [d[0] - a[0], d[1] - a[1]];
  const lx = Math.hypot(ex[0], ex[1]);
  const ly = Math.hypot(ey[0], ey[1]);
  const px = point[0] - a[0];
  const py = point[1] - a[1];
  const s = (px * ex[0] + py * ex[1]) / lx;
  const t = (px * ey[0] + py * ey[1]) / ly;
  return s >= -tolerance && s <= lx + tolerance && t >= -tolerance && t <= ly + tolerance;
}

/** Direction (0–180) in which a cut's along edge runs. */
export function cutAlongDirection(cut: LayoutCut): number {
  const [a, , , d] = cut.corners;
  const angle = (Math.atan2(d[1] - a[1], d[0] - a[0]) * 180) / Math.PI;
  return ((angle % 180) + 180) % 180;
}

/** Smallest difference between two directions modulo 180°. */
export function directionGap(a: number, b: number): number {
  const gap = Math.abs(a - b) % 180;
  return Math.min(gap, 180 - gap);
}

/** Do two cuts placed on one piece overlap (in the piece's own coordinates)? */
export function cutsOverlapOnPiece(a: LayoutCut, b: LayoutCut): boolean {
  const eps = 2e-4; // offsets and widths are each rounded to 1/10000 ft
  return (
    a.acrossOffsetFt + a.acrossFt > b.acrossOffsetFt + eps &&
    b.acrossOffsetFt + b.acrossFt > a.acrossOffsetFt + eps &&
    a.alongOffsetFt + a.alongFt > b.alongOffsetFt + eps &&
    b.alongOffsetFt + b.alongFt > a.alongOffsetFt + eps
  );
}

/** Sum of width × length over the pieces. */
export function piecesSqFt(plan: LayoutPlan): number {
  return plan.pieces.reduce((sum, piece) => sum + piece.widthFt * piece.lengthFt, 0);
}
