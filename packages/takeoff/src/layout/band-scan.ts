import type { FramePolygon } from './frame-polygon.js';
import { ScanBuffers } from './scan-buffers.js';
import { finishScan } from './scan-finish.js';
import { MINUS, PLUS } from './scan-sides.js';

export { SLIVER_FT } from './scan-sides.js';

/** One connected part of the area inside one strip (band), as extents in the grain frame. */
export interface BandPart {
  readonly band: number;
  readonly uMin: number;
  readonly uMax: number;
  readonly vMin: number;
  readonly vMax: number;
}

/** A stretch of a strip boundary with area on both sides: a side seam, in frame coordinates. */
export interface SideSeamSpan {
  readonly line: number;
  readonly u: number;
  readonly vFrom: number;
  readonly vTo: number;
}

/** The parts (sorted by band, then start) and side seams of the area cut by strip boundaries. */
export interface BandScan {
  readonly parts: BandPart[];
  readonly sideSeams: SideSeamSpan[];
}

const buffers = new ScanBuffers();
let lines: ArrayLike<number> = [];

/**
 * Zone of a coordinate among sorted boundaries: 2j when exactly on boundary j, 2j + 1 when
 * strictly between boundaries j and j + 1. Boundaries are treated as infinitely thin gaps:
 * each band is the open strip between two boundaries, so a yard edge lying on a boundary
 * belongs to no band and creates no zero-width part.
 */
function zoneOf(value: number): number {
  let low = 0;
  let high = lines.length - 1;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if ((lines[mid] as number) <= value) low = mid;
    else high = mid - 1;
  }
  return value === lines[low] ? 2 * low : 2 * low + 1;
}

function openChain(band: number, ring: number): number {
  if (buffers.chainCount === buffers.chainBand.length) buffers.growChains();
  const id = buffers.chainCount++;
  buffers.chainBand[id] = band;
  buffers.chainRing[id] = ring;
  buffers.chainParent[id] = id;
  buffers.chainULo[id] = Infinity;
  buffers.chainUHi[id] = -Infinity;
  buffers.chainVLo[id] = Infinity;
  buffers.chainVHi[id] = -Infinity;
  return id;
}

function extendChain(chain: number, pu: number, pv: number): void {
  if (pu < (buffers.chainULo[chain] as number)) buffers.chainULo[chain] = pu;
  if (pu > (buffers.chainUHi[chain] as number)) buffers.chainUHi[chain] = pu;
  if (pv < (buffers.chainVLo[chain] as number)) buffers.chainVLo[chain] = pv;
  if (pv > (buffers.chainVHi[chain] as number)) buffers.chainVHi[chain] = pv;
}

function addCrossing(line: number, side: number, pv: number, slope: number, chain: number): void {
  if (buffers.crossCount === buffers.crossGroup.length) buffers.growCrossings();
  const id = buffers.crossCount++;
  buffers.crossGroup[id] = line * 2 + side;
  buffers.crossV[id] = pv;
  buffers.crossSlope[id] = slope;
  buffers.crossChain[id] = chain;
  extendChain(chain, lines[line] as number, pv);
}

function vAtLine(line: number, up: number, vp: number, uq: number, vq: number): number {
  const at = lines[line] as number;
  if (at === up) return vp;
  if (at === uq) return vq;
  return vp + ((at - up) / (uq - up)) * (vq - vp);
}

/**
 * Follows edge p→q between two different zones: closes the chain p is in, adds a chain per
 * band crossed whole, opens the chain q lies in. Returns the chain current at q, or -1.
 */
function crossEdge(
  up: number,
  vp: number,
  uq: number,
  vq: number,
  zoneP: number,
  zoneQ: number,
  current: number,
  ring: number,
): number {
  const slope = (vq - vp) / (uq - up);
  const rightward = zoneQ > zoneP;
  if (zoneP % 2 === 1) {
    const bandP = (zoneP - 1) / 2;
    const exitLine = rightward ? bandP + 1 : bandP;
    addCrossing(
      exitLine,
      rightward ? MINUS : PLUS,
      vAtLine(exitLine, up, vp, uq, vq),
      slope,
      current,
    );
  }
  const low = rightward ? (zoneP >> 1) + (zoneP % 2) : (zoneQ >> 1) + (zoneQ % 2);
  const high = rightward ? (zoneQ >> 1) - 1 : (zoneP >> 1) - 1;
  for (let band = low; band <= high; band += 1) {
    const chain = openChain(band, ring);
    addCrossing(band, PLUS, vAtLine(band, up, vp, uq, vq), slope, chain);
    addCrossing(band + 1, MINUS, vAtLine(band + 1, up, vp, uq, vq), slope, chain);
  }
  if (zoneQ % 2 === 0) return -1;
  const bandQ = (zoneQ - 1) / 2;
  const chain = openChain(bandQ, ring);
  const entryLine = rightward ? bandQ : bandQ + 1;
  addCrossing(
    entryLine,
    rightward ? PLUS : MINUS,
    vAtLine(entryLine, up, vp, uq, vq),
    slope,
    chain,
  );
  return chain;
}

/**
 * Fast exact scan of the area against strip boundaries (sorted, first ≤ uMin, last ≥ uMax).
 * Walks every ring once, splitting it into chains inside each band; chains whose ends are
 * joined by an inside stretch of a boundary belong to the same connected part (union-find).
 * Linear in the vertex count plus a sort of the boundary crossings. The returned buffers
 * are shared and valid until the next scan.
 */
export function runScan(polygon: FramePolygon, boundaries: ArrayLike<number>): ScanBuffers {
  const { u, v, ringStart } = polygon;
  lines = boundaries;
  buffers.reset();
  for (let r = 0; r + 1 < ringStart.length; r += 1) {
    const start = ringStart[r] as number;
    const count = (ringStart[r + 1] as number) - start;
    const firstZone = zoneOf(u[start] as number);
    let current = firstZone % 2 === 1 ? openChain((firstZone - 1) / 2, r) : -1;
    if (current >= 0) extendChain(current, u[start] as number, v[start] as number);
    const startChain = current;
    let zoneP = firstZone;
    for (let i = 0; i < count; i += 1) {
      const p = start + i;
      const q = i + 1 === count ? start : p + 1;
      const uq = u[q] as number;
      const zoneQ = zoneOf(uq);
      if (zoneP !== zoneQ)
        current = crossEdge(
          u[p] as number,
          v[p] as number,
          uq,
          v[q] as number,
          zoneP,
          zoneQ,
          current,
          r,
        );
      if (zoneQ % 2 === 1) extendChain(current, uq, v[q] as number);
      zoneP = zoneQ;
    }
    if (startChain >= 0 && current !== startChain) {
      const a = startChain < current ? startChain : current;
      buffers.chainParent[a === startChain ? current : startChain] = a;
    }
  }
  finishScan(buffers, lines);
  return buffers;
}

/** Part indices of the last scan in plan order: by band, then start along, then across. */
export function sortedPartOrder(scan: ScanBuffers): number[] {
  const order = Array.from({ length: scan.partCount }, (_, i) => i);
  return order.sort(
    (a, b) =>
      (scan.partBand[a] as number) - (scan.partBand[b] as number) ||
      (scan.partVLo[a] as number) - (scan.partVLo[b] as number) ||
      (scan.partULo[a] as number) - (scan.partULo[b] as number),
  );
}

/** The scan as plain objects (for the final layout and tests). */
export function scanBands(polygon: FramePolygon, boundaries: ArrayLike<number>): BandScan {
  const scan = runScan(polygon, boundaries);
  const parts = sortedPartOrder(scan).map((i) => ({
    band: scan.partBand[i] as number,
    uMin: scan.partULo[i] as number,
    uMax: scan.partUHi[i] as number,
    vMin: scan.partVLo[i] as number,
    vMax: scan.partVHi[i] as number,
  }));
  const sideSeams = Array.from({ length: scan.seamCount }, (_, i) => ({
    line: scan.seamLine[i] as number,
    u: boundaries[scan.seamLine[i] as number] as number,
    vFrom: scan.seamVLo[i] as number,
    vTo: scan.seamVHi[i] as number,
  }));
  return { parts, sideSeams };
}
