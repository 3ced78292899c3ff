import { fromFrame } from '../geometry/grain-frame.js';
import { lengthInsideCapsules } from '../geometry/traffic.js';
import { runScan, scanBands } from './band-scan.js';
import { partsToCuts, unitsFor } from './cuts.js';
import type { AngleContext } from './evaluate-offset.js';
import { boundaryLines } from './evaluate-offset.js';
import { packCuts } from './pack.js';
import type { ScanBuffers } from './scan-buffers.js';

/** The figures that rank one strip offset; `orderedUnits` is exact whenever ≤ the bound. */
export interface OffsetScore {
  readonly offset: number;
  readonly orderedUnits: number;
  /** Steps the simple strip layout at this offset buys (always exact). */
  readonly simpleUnits: number;
  readonly seamCount: number;
  readonly trafficSeamFt: number;
}

/** The best turf amount (in steps) seen so far; offsets that cannot reach it skip packing. */
export interface SearchBound {
  units: number;
}

function trafficFeetOfScan(
  context: AngleContext,
  scan: ScanBuffers,
  lines: readonly number[],
): number {
  const { frame } = context.polygon;
  const capsules = context.walkways.flat();
  let total = 0;
  for (let s = 0; s < scan.seamCount; s += 1) {
    const u = lines[scan.seamLine[s] as number] as number;
    const from = fromFrame(frame, u, scan.seamVLo[s] as number);
    const to = fromFrame(frame, u, scan.seamVHi[s] as number);
    total += lengthInsideCapsules(from, to, capsules);
  }
  return total;
}

/**
 * Fast score of one offset: band scan, cut lengths, and offcut packing only when its lower
 * bound (the longest cut, or the cut area over the roll width) could reach `bound`. A
 * pruned offset keeps its simple-layout figure, which is then above the bound anyway.
 */
export function scoreOffset(
  context: AngleContext,
  offset: number,
  bound: SearchBound,
): OffsetScore {
  const { rules } = context;
  const lines = boundaryLines(context.polygon, rules.widthFt, offset);
  const scan = runScan(context.polygon, lines);
  let simpleUnits = 0;
  let butts = 0;
  let longest = 0;
  let areaUnits = 0;
  let narrowest = Infinity;
  let nextNarrowest = Infinity;
  for (let p = 0; p < scan.partCount; p += 1) {
    const units = unitsFor((scan.partVHi[p] as number) - (scan.partVLo[p] as number), rules);
    const width = Math.min(
      rules.widthFt,
      (scan.partUHi[p] as number) - (scan.partULo[p] as number),
    );
    const pieces = Math.ceil(units / rules.maxUnits);
    simpleUnits += units;
    butts += pieces - 1;
    longest = Math.max(longest, Math.min(units, rules.maxUnits));
    areaUnits += width * units;
    for (let k = 0; k < pieces; k += 1) {
      if (width < narrowest) [narrowest, nextNarrowest] = [width, narrowest];
      else if (width < nextNarrowest) nextNarrowest = width;
    }
  }
  let orderedUnits = simpleUnits;
  const seamCount = scan.seamCount + butts;
  const canShare = narrowest + nextNarrowest <= rules.widthFt + 1e-9;
  const lowerBound = Math.max(longest, Math.ceil(areaUnits / rules.widthFt - 1e-9));
  if (canShare && lowerBound <= bound.units && lowerBound < simpleUnits) {
    // scanBands re-runs the same scan into the same buffers, so `scan` stays valid.
    const { cuts } = partsToCuts(scanBands(context.polygon, lines).parts, rules);
    const packed = packCuts(
      cuts.map((cut) => ({ widthFt: cut.acrossFt, units: cut.units })),
      rules.widthFt,
    );
    orderedUnits = Math.min(simpleUnits, packed.totalUnits);
  }
  const needsTraffic = context.walkways.length > 0 && orderedUnits <= bound.units;
  const trafficSeamFt = needsTraffic ? trafficFeetOfScan(context, scan, lines) : 0;
  if (orderedUnits < bound.units) bound.units = orderedUnits;
  return { offset, orderedUnits, simpleUnits, seamCount, trafficSeamFt };
}
