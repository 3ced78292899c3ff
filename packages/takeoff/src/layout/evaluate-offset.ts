import { fromFrame, snap } from '../geometry/grain-frame.js';
import { lengthInsideCapsules } from '../geometry/traffic.js';
import type { Capsule } from '../geometry/traffic.js';
import type { BandPart, SideSeamSpan } from './band-scan.js';
import { partsToCuts } from './cuts.js';
import type { ButtLine, CutRules, FrameCut } from './cuts.js';
import type { FramePolygon } from './frame-polygon.js';
import { canShare, packCuts } from './pack.js';
import type { Packing } from './pack.js';

/** Everything fixed for one grain direction while strip offsets are tried. */
export interface AngleContext {
  readonly polygon: FramePolygon;
  readonly rules: CutRules;
  /** Walkways as capsules, one list per traffic path. */
  readonly walkways: readonly (readonly Capsule[])[];
}

/** One strip layout at one offset: parts, cuts, the cheaper of plain and packed buying. */
export interface LayoutCandidate {
  readonly offset: number;
  readonly lines: number[];
  readonly parts: BandPart[];
  readonly sideSeams: SideSeamSpan[];
  readonly cuts: FrameCut[];
  readonly buttLines: ButtLine[];
  /** Steps bought by the simple layout: one full-width piece per cut. */
  readonly simpleUnits: number;
  /** The offcut-reuse packing, kept only when it buys fewer steps than the simple layout. */
  readonly packing: Packing | null;
  readonly orderedUnits: number;
  readonly seamCount: number;
  /** Side-seam feet inside walkways (0 without traffic paths). */
  readonly trafficSeamFt: number;
}

/** Strip boundaries through `offset`, spaced one roll width apart, spanning the area. */
export function boundaryLines(polygon: FramePolygon, widthFt: number, offset: number): number[] {
  let j = Math.floor((polygon.uMin - offset) / widthFt);
  let line = snap(offset + j * widthFt);
  while (line > polygon.uMin) {
    j -= 1;
    line = snap(offset + j * widthFt);
  }
  const lines = [line];
  while (line < polygon.uMax) {
    j += 1;
    line = snap(offset + j * widthFt);
    lines.push(line);
  }
  return lines;
}

function trafficFeet(context: AngleContext, seams: readonly SideSeamSpan[]): number {
  if (context.walkways.length === 0) return 0;
  const { frame } = context.polygon;
  const capsules = context.walkways.flat();
  return seams.reduce(
    (sum, seam) =>
      sum +
      lengthInsideCapsules(
        fromFrame(frame, seam.u, seam.vFrom),
        fromFrame(frame, seam.u, seam.vTo),
        capsules,
      ),
    0,
  );
}

/** Builds the candidate for known parts (from the fast scan or from polygon clipping). */
export function evaluateParts(
  context: AngleContext,
  offset: number,
  lines: number[],
  parts: BandPart[],
  sideSeams: SideSeamSpan[],
): LayoutCandidate {
  const { cuts, buttLines } = partsToCuts(parts, context.rules);
  const simpleUnits = cuts.reduce((sum, cut) => sum + cut.units, 0);
  const items = cuts.map((cut) => ({ widthFt: cut.acrossFt, units: cut.units }));
  const packed = canShare(items, context.rules.widthFt)
    ? packCuts(items, context.rules.widthFt)
    : null;
  const packing = packed && packed.totalUnits < simpleUnits ? packed : null;
  return {
    offset,
    lines,
    parts,
    sideSeams,
    cuts,
    buttLines,
    simpleUnits,
    packing,
    orderedUnits: packing ? packing.totalUnits : simpleUnits,
    seamCount: sideSeams.length + buttLines.length,
    trafficSeamFt: trafficFeet(context, sideSeams),
  };
}

const TRAFFIC_TOLERANCE_FT = 1e-6;

/** The figures layouts are ranked by. */
export interface RankFigures {
  readonly orderedUnits: number;
  readonly trafficSeamFt: number;
  readonly seamCount: number;
}

/**
 * Order of preference: less turf bought, then fewer seam feet inside walkways, then fewer
 * seams. Returns < 0 when `a` is better, 0 on a tie (callers keep the earlier one).
 */
export function compareCandidates(a: RankFigures, b: RankFigures): number {
  if (a.orderedUnits !== b.orderedUnits) return a.orderedUnits - b.orderedUnits;
  if (Math.abs(a.trafficSeamFt - b.trafficSeamFt) > TRAFFIC_TOLERANCE_FT)
    return a.trafficSeamFt - b.trafficSeamFt;
  return a.seamCount - b.seamCount;
}
