import {
  cubicYardsOfLayer,
  ouncesToPounds,
  poundsToShortTons,
  sqFtToSqYd,
} from '../units/conversions.js';

/**
 * The small formulas behind the takeoff lines, kept separate so each can be checked against
 * the trade's worked numbers on its own.
 */

// Floating-point products such as 0.1 × 3 land a hair above a whole number; without this slack
// 18.000000000000004 bags would round up to 19.
const EPSILON = 1e-9;

/** Rounds up to a whole number, ignoring floating-point noise just above it. */
export function ceilWhole(value: number): number {
  return Math.max(0, Math.ceil(value - EPSILON));
}

/** Rounds up to a multiple of `step` (e.g. half cubic yards). */
export function roundUpTo(value: number, step: number): number {
  const steps = ceilWhole(value / step);
  // Rounding again strips float noise such as 0.1 × 3 = 0.30000000000000004.
  return Number((steps * step).toFixed(10));
}

/** Rounds to `decimals` places for display-grade quantities. */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}

/** Fasteners around a closed loop: one every `spacingIn`, so ceil(length ÷ spacing). */
export function fastenersForClosedLoop(lengthFt: number, spacingIn: number): number {
  return ceilWhole((lengthFt * 12) / spacingIn);
}

/** Fasteners along an open run: both ends get one, so ceil(length ÷ spacing) + 1 (0 if no run). */
export function fastenersForOpenRun(lengthFt: number, spacingIn: number): number {
  return lengthFt > 0 ? ceilWhole((lengthFt * 12) / spacingIn) + 1 : 0;
}

/** Loose-to-compacted factor from a swell and a shrink: (1 + swell) ÷ (1 − shrink). */
export function looseToCompactedFactor(swellPercent: number, shrinkPercent: number): number {
  return (1 + swellPercent / 100) / (1 - shrinkPercent / 100);
}

/** Bank (in-place) cubic yards of soil dug `depthIn` deep over `areaSqFt`. */
export const bankCubicYards = cubicYardsOfLayer;

/** Loose volume once dug: bank × (1 + swell). */
export function looseFromBank(bankCuYd: number, swellPercent: number): number {
  return bankCuYd * (1 + swellPercent / 100);
}

/** Short tons of a material from its volume and density (tons per cu yd). */
export function tonsFromCubicYards(cuYd: number, tonsPerCuYd: number): number {
  return cuYd * tonsPerCuYd;
}

/** Short tons of a material from its volume and density (lb per cu yd). */
export function tonsFromPoundsPerCubicYard(cuYd: number, lbPerCuYd: number): number {
  return poundsToShortTons(cuYd * lbPerCuYd);
}

/** Bags needed for `pounds` of material: always whole bags, rounded up. */
export function bagsFor(pounds: number, bagLb: number): number {
  return ceilWhole(pounds / bagLb);
}

/** Square feet one bag covers at a rate in lb per sq ft. */
export function bagCoverageSqFt(bagLb: number, rateLbPerSqFt: number): number {
  return bagLb / rateLbPerSqFt;
}

/** Stock pieces for a run, with waste: ceil(length × (1 + waste) ÷ stock length). */
export function stockPieces(lengthFt: number, stockLengthFt: number, wastePercent: number): number {
  return ceilWhole((lengthFt * (1 + wastePercent / 100)) / stockLengthFt);
}

/** Weight of a turf piece in lb: area in sq yd × (face + backing oz per sq yd) ÷ 16. */
export function turfPieceWeightLb(
  widthFt: number,
  lengthFt: number,
  totalOzPerSqYd: number,
): number {
  return ouncesToPounds(sqFtToSqYd(widthFt * lengthFt) * totalOzPerSqYd);
}

/** Fall over a run at a slope in percent, in inches (2 % over 30 ft = 7.2 in). */
export function slopeFallIn(runFt: number, slopePercent: number): number {
  return runFt * (slopePercent / 100) * 12;
}

/** Struck volume of a box (truck bed, roll-off) in cubic yards. */
export function boxVolumeCuYd(lengthFt: number, widthFt: number, depthFt: number): number {
  return (lengthFt * widthFt * depthFt) / 27;
}

/** Loads needed when a box holds `capacityCuYd` and may carry `capacityTons`. */
export function loadsNeeded(
  looseCuYd: number,
  tons: number,
  capacityCuYd: number,
  capacityTons: number,
) {
  const byVolume = ceilWhole(looseCuYd / capacityCuYd);
  const byWeight = ceilWhole(tons / capacityTons);
  return {
    byVolume,
    byWeight,
    loads: Math.max(byVolume, byWeight),
    isWeightLimited: byWeight > byVolume,
  };
}
