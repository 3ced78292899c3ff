import type { JobCost, JobCosts, SeamTotals } from './types.js';

/** The figures a layout (one area, or the whole job) is ranked by. */
export interface Figures {
  /** New turf bought (sq ft). */
  readonly orderedSqFt: number;
  /** Side-seam feet inside walkways. */
  readonly trafficSeamFt: number;
  readonly seams: SeamTotals;
}

const SQFT_TOLERANCE = 1e-6;
const FT_TOLERANCE = 1e-6;

/** Installed cost in cents: new turf at the turf rate, side and butt seams at theirs. */
export function costOf(figures: Figures, costs: JobCosts): JobCost {
  const turfCents = Math.round(figures.orderedSqFt * costs.turfCentsPerSqFt);
  const seamCents = Math.round(
    figures.seams.sideFt * costs.sideSeamCentsPerFt +
      figures.seams.buttFt * costs.buttSeamCentsPerFt,
  );
  return { turfCents, seamCents, totalCents: turfCents + seamCents };
}

/** Unrounded installed cost, for ranking. */
function rawCost(figures: Figures, costs: JobCosts): number {
  return (
    figures.orderedSqFt * costs.turfCentsPerSqFt +
    figures.seams.sideFt * costs.sideSeamCentsPerFt +
    figures.seams.buttFt * costs.buttSeamCentsPerFt
  );
}

function compareTurfFirst(a: Figures, b: Figures): number {
  if (Math.abs(a.orderedSqFt - b.orderedSqFt) > SQFT_TOLERANCE)
    return a.orderedSqFt - b.orderedSqFt;
  if (Math.abs(a.trafficSeamFt - b.trafficSeamFt) > FT_TOLERANCE)
    return a.trafficSeamFt - b.trafficSeamFt;
  return a.seams.count - b.seams.count;
}

/**
 * Order of preference (< 0: `a` is better, 0: a tie, callers keep the earlier one). With
 * costs: cheaper installed first, then the turf-first order. Without: the single-area
 * ranking — less turf, then fewer seam feet in walkways, then fewer seams.
 */
export function compareFigures(a: Figures, b: Figures, costs: JobCosts | undefined): number {
  if (costs) {
    const gap = rawCost(a, costs) - rawCost(b, costs);
    if (Math.abs(gap) > 1e-6) return gap;
  }
  return compareTurfFirst(a, b);
}

/** Fewest seams first (count, then seam feet), then the turf-first order. */
export function compareSeamsFirst(a: Figures, b: Figures): number {
  if (a.seams.count !== b.seams.count) return a.seams.count - b.seams.count;
  const feet = a.seams.sideFt + a.seams.buttFt - (b.seams.sideFt + b.seams.buttFt);
  if (Math.abs(feet) > FT_TOLERANCE) return feet;
  return compareTurfFirst(a, b);
}

/** Least turf first, then fewer seam feet, then the turf-first order. */
export function compareTurfOnly(a: Figures, b: Figures): number {
  if (Math.abs(a.orderedSqFt - b.orderedSqFt) > SQFT_TOLERANCE)
    return a.orderedSqFt - b.orderedSqFt;
  const feet = a.seams.sideFt + a.seams.buttFt - (b.seams.sideFt + b.seams.buttFt);
  if (Math.abs(feet) > FT_TOLERANCE) return feet;
  return compareTurfFirst(a, b);
}

/** Adds seam totals. */
export function addSeams(a: SeamTotals, b: SeamTotals): SeamTotals {
  return { count: a.count + b.count, sideFt: a.sideFt + b.sideFt, buttFt: a.buttFt + b.buttFt };
}
