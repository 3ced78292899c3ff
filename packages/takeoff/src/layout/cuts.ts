import type { BandPart } from './band-scan.js';

/**
 * Lengths within this much of a whole step round down rather than up: rotation and snapping
 * leave noise of a few millionths of a foot, and a 20.000001 ft part is a 20 ft cut.
 */
const LENGTH_NOISE_FT = 1e-4;

/** How cuts are sized: roll width, length step, the longest piece in steps, trim per end. */
export interface CutRules {
  readonly widthFt: number;
  readonly stepFt: number;
  readonly maxUnits: number;
  readonly trimFt: number;
}

/** A rectangle to cut, in the grain frame: across [uMin, uMin + acrossFt], along from vStart. */
export interface FrameCut {
  readonly band: number;
  readonly part: number;
  readonly uMin: number;
  readonly acrossFt: number;
  readonly vStart: number;
  /** Length in whole steps. */
  readonly units: number;
}

/** A butt seam line across a part, in the grain frame. */
export interface ButtLine {
  readonly part: number;
  readonly v: number;
  readonly uMin: number;
  readonly uMax: number;
}

/** The longest piece allowed, in whole steps. */
export function maxUnitsFor(maxLengthFt: number, stepFt: number): number {
  return Math.floor(maxLengthFt / stepFt + 1e-9);
}

/** Whole steps needed to cover a length (with trim at both ends). */
export function unitsFor(lengthFt: number, rules: CutRules): number {
  return Math.max(1, Math.ceil((lengthFt + 2 * rules.trimFt - LENGTH_NOISE_FT) / rules.stepFt));
}

/**
 * One cut per part (its bounding rectangle, length rounded up to the step); parts longer than
 * the longest piece become several cuts end to end, joined by butt seams. Full-length cuts
 * come first and the remainder last, so most pieces are whole roll lengths.
 */
export function partsToCuts(
  parts: readonly BandPart[],
  rules: CutRules,
): { cuts: FrameCut[]; buttLines: ButtLine[] } {
  const cuts: FrameCut[] = [];
  const buttLines: ButtLine[] = [];
  parts.forEach((part, index) => {
    const total = unitsFor(part.vMax - part.vMin, rules);
    const acrossFt = Math.min(rules.widthFt, part.uMax - part.uMin);
    let done = 0;
    let vStart = part.vMin - rules.trimFt;
    while (done < total) {
      const units = Math.min(rules.maxUnits, total - done);
      if (done > 0)
        buttLines.push({ part: index, v: vStart, uMin: part.uMin, uMax: part.uMin + acrossFt });
      cuts.push({ band: part.band, part: index, uMin: part.uMin, acrossFt, vStart, units });
      done += units;
      vStart += units * rules.stepFt;
    }
  });
  return { cuts, buttLines };
}
