import type { Pt, Snapping } from './types';

/** How close (feet) a point must come to a grid line or a square-up to be pulled onto it. */
export interface SnapInput {
  readonly point: Pt;
  /** The points either side of the one being placed (previous first); may be empty. */
  readonly neighbours: readonly Pt[];
  readonly snapping: Snapping;
  /** Pull distance in feet; the canvas passes a few screen pixels' worth. */
  readonly toleranceFt: number;
}

function roundTo(value: number, step: number): number {
  // `|| 0` turns -0 into 0, so a snapped point reads and compares as typed.
  return Math.round(Math.round(value / step) * step * 1e6) / 1e6 || 0;
}

/**
 * Where a clicked or dragged point lands. First onto the grid (when on); then, with angle
 * snapping on, squared up: an x or y within the tolerance of a neighbour's is made equal
 * (90° sides), and otherwise a side to the previous point close to 45° is made exactly 45°.
 */
export function snapPoint({ point, neighbours, snapping, toleranceFt }: SnapInput): Pt {
  let [x, y] = point;
  const grid = snapping.gridFt;
  if (grid !== null && grid > 0) {
    x = roundTo(x, grid);
    y = roundTo(y, grid);
  }
  if (!snapping.angles) return [x, y];
  let squared = false;
  for (const [nx, ny] of neighbours) {
    if (Math.abs(x - nx) <= toleranceFt) {
      x = nx;
      squared = true;
    }
    if (Math.abs(y - ny) <= toleranceFt) {
      y = ny;
      squared = true;
    }
  }
  const previous = neighbours[0];
  if (!squared && previous) {
    const dx = x - previous[0];
    const dy = y - previous[1];
    if (Math.abs(Math.abs(dx) - Math.abs(dy)) <= toleranceFt * 2) {
      const raw = (Math.abs(dx) + Math.abs(dy)) / 2;
      const run = grid !== null && grid > 0 ? roundTo(raw, grid) : raw;
      x = previous[0] + Math.sign(dx) * run;
      y = previous[1] + Math.sign(dy) * run;
    }
  }
  return [roundTo(x, 1e-6), roundTo(y, 1e-6)];
}
