import type { JobCut, JobPlan } from './types.js';

/** Checks for the job tests, written independently of the packer (not part of the public surface). */

/** A rectangle in a piece's own frame: x across the width, y along the length. */
interface PieceRect {
  readonly x: number;
  readonly y: number;
  readonly w: number;
  readonly h: number;
}

const EPS = 2e-4; // offsets and sizes are each rounded to 1/10000 ft

function rectOf(cut: JobCut): PieceRect {
  return { x: cut.acrossOffsetFt, y: cut.alongOffsetFt, w: cut.acrossFt, h: cut.alongFt };
}

function overlap(a: PieceRect, b: PieceRect): boolean {
  return (
    a.x + a.w > b.x + EPS && b.x + b.w > a.x + EPS && a.y + a.h > b.y + EPS && b.y + b.h > a.y + EPS
  );
}

/**
 * Can the rectangles be separated by straight through-cuts, recursively? A cut along x = c
 * (or y = c) is allowed when no rectangle straddles it and both sides keep at least one.
 */
export function isGuillotine(rects: readonly PieceRect[]): boolean {
  if (rects.length <= 1) return true;
  for (const axis of ['x', 'y'] as const) {
    const size = axis === 'x' ? 'w' : 'h';
    const lines = [...new Set(rects.map((r) => r[axis] + r[size]))].sort((a, b) => a - b);
    for (const line of lines) {
      if (rects.some((r) => r[axis] < line - EPS && r[axis] + r[size] > line + EPS)) continue;
      const before = rects.filter((r) => r[axis] + r[size] <= line + EPS);
      const after = rects.filter((r) => r[axis] + r[size] > line + EPS);
      if (before.length > 0 && after.length > 0) return isGuillotine(before) && isGuillotine(after);
    }
  }
  return false;
}

/** Problems with how the cuts of every area sit in the job's pieces (empty when all is well). */
export function packingProblems(plan: JobPlan): string[] {
  const problems: string[] = [];
  plan.pieces.forEach((piece, index) => {
    const rects = plan.areas.flatMap((area) =>
      area.cuts.filter((cut) => cut.piece === index).map(rectOf),
    );
    if (rects.length === 0) problems.push(`piece ${index} has no cuts`);
    for (const r of rects) {
      if (
        r.x < -EPS ||
        r.y < -EPS ||
        r.x + r.w > piece.widthFt + EPS ||
        r.y + r.h > piece.lengthFt + EPS
      )
        problems.push(`piece ${index}: a cut lies outside the piece`);
    }
    rects.forEach((a, i) =>
      rects.slice(i + 1).forEach((b) => {
        if (overlap(a, b)) problems.push(`piece ${index}: cuts overlap`);
      }),
    );
    if (!isGuillotine(rects)) problems.push(`piece ${index}: not cut with through-cuts`);
  });
  for (const area of plan.areas)
    for (const cut of area.cuts)
      if (!plan.pieces[cut.piece]) problems.push(`${area.id}: cut names piece ${cut.piece}`);
  return problems;
}

/** Direction (0–360) in which a cut's along edge runs, from its start to its end. */
export function cutGrainDirection(cut: JobCut): number {
  const [a, , , d] = cut.corners;
  const angle = (Math.atan2(d[1] - a[1], d[0] - a[0]) * 180) / Math.PI;
  return ((angle % 360) + 360) % 360;
}

/** Smallest difference between two directions modulo 360°. */
export function turnGap(a: number, b: number): number {
  const gap = Math.abs(a - b) % 360;
  return Math.min(gap, 360 - gap);
}

/** New turf: Σ width × length over new pieces. */
export function newSqFt(plan: JobPlan): number {
  return plan.pieces
    .filter((piece) => piece.source === 'new')
    .reduce((sum, piece) => sum + piece.widthFt * piece.lengthFt, 0);
}
