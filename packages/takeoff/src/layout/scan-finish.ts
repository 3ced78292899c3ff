import type { ScanBuffers } from './scan-buffers.js';
import { PLUS, SLIVER_FT } from './scan-sides.js';

let scan: ScanBuffers;

function find(a: number): number {
  const parent = scan.chainParent;
  let root = a;
  while (parent[root] !== root) root = parent[root] as number;
  let node = a;
  while (node !== root) {
    const next = parent[node] as number;
    parent[node] = root;
    node = next;
  }
  return root;
}

function union(a: number, b: number): void {
  const rootA = find(a);
  const rootB = find(b);
  if (rootA < rootB) scan.chainParent[rootB] = rootA;
  else if (rootB < rootA) scan.chainParent[rootA] = rootB;
}

/** Order of crossings: by boundary side, then along it; ties as seen a hair inside the band. */
function compareCrossings(i: number, j: number): number {
  const group = (scan.crossGroup[i] as number) - (scan.crossGroup[j] as number);
  if (group !== 0) return group;
  const dv = (scan.crossV[i] as number) - (scan.crossV[j] as number);
  if (dv !== 0) return dv;
  const ds = (scan.crossSlope[i] as number) - (scan.crossSlope[j] as number);
  return (scan.crossGroup[i] as number) % 2 === PLUS ? ds : -ds;
}

function collectParts(): void {
  const count = scan.chainCount;
  for (let c = 0; c < count; c += 1) {
    scan.rootPart[c] = -1;
    scan.rootCrossed[c] = 0;
  }
  for (let k = 0; k < scan.crossCount; k += 1)
    scan.rootCrossed[find(scan.crossChain[k] as number)] = 1;
  for (let c = 0; c < count; c += 1) {
    const root = find(c);
    // A chain class with no boundary crossing is a whole ring inside one band: the outer
    // ring (the whole area fits in one strip) is a part; a hole lies inside a part already.
    if (scan.rootCrossed[root] === 0 && scan.chainRing[root] !== 0) continue;
    let part = scan.rootPart[root] as number;
    if (part < 0) {
      if (scan.partCount === scan.partBand.length) scan.growParts();
      part = scan.partCount++;
      scan.rootPart[root] = part;
      scan.partBand[part] = scan.chainBand[root] as number;
      scan.partULo[part] = Infinity;
      scan.partUHi[part] = -Infinity;
      scan.partVLo[part] = Infinity;
      scan.partVHi[part] = -Infinity;
    }
    scan.partULo[part] = Math.min(scan.partULo[part] as number, scan.chainULo[c] as number);
    scan.partUHi[part] = Math.max(scan.partUHi[part] as number, scan.chainUHi[c] as number);
    scan.partVLo[part] = Math.min(scan.partVLo[part] as number, scan.chainVLo[c] as number);
    scan.partVHi[part] = Math.max(scan.partVHi[part] as number, scan.chainVHi[c] as number);
  }
  let kept = 0;
  for (let p = 0; p < scan.partCount; p += 1) {
    const wide = (scan.partUHi[p] as number) - (scan.partULo[p] as number) >= SLIVER_FT;
    const long = (scan.partVHi[p] as number) - (scan.partVLo[p] as number) >= SLIVER_FT;
    if (!wide || !long) continue;
    scan.partBand[kept] = scan.partBand[p] as number;
    scan.partULo[kept] = scan.partULo[p] as number;
    scan.partUHi[kept] = scan.partUHi[p] as number;
    scan.partVLo[kept] = scan.partVLo[p] as number;
    scan.partVHi[kept] = scan.partVHi[p] as number;
    kept += 1;
  }
  scan.partCount = kept;
}

function addSeam(line: number, from: number, to: number): void {
  if (scan.seamCount === scan.seamLine.length) scan.growSeams();
  scan.seamLine[scan.seamCount] = line;
  scan.seamVLo[scan.seamCount] = from;
  scan.seamVHi[scan.seamCount] = to;
  scan.seamCount += 1;
}

/**
 * Side seams: on each inner boundary, where the inside stretches seen from the left band
 * (MINUS) overlap those seen from the right band (PLUS) there is area on both sides.
 */
function groupAt(order: readonly number[], k: number): number {
  return scan.crossGroup[order[k] as number] as number;
}

function vAt(order: readonly number[], k: number): number {
  return scan.crossV[order[k] as number] as number;
}

function collectSeams(order: readonly number[]): void {
  const n = order.length;
  let k = 0;
  while (k < n) {
    const group = groupAt(order, k);
    let end = k;
    while (end < n && groupAt(order, end) === group) end += 2;
    if (group % 2 === PLUS || end >= n || groupAt(order, end) !== group + 1) {
      k = end;
      continue;
    }
    let plusEnd = end;
    while (plusEnd < n && groupAt(order, plusEnd) === group + 1) plusEnd += 2;
    for (let i = k, j = end; i < end && j < plusEnd;) {
      const from = Math.max(vAt(order, i), vAt(order, j));
      const to = Math.min(vAt(order, i + 1), vAt(order, j + 1));
      if (to - from >= SLIVER_FT) addSeam(group >> 1, from, to);
      if (vAt(order, i + 1) < vAt(order, j + 1)) i += 2;
      else j += 2;
    }
    k = plusEnd;
  }
}

/** Insertion sort for the usual handful of crossings; the built-in sort for many. */
function sortCrossings(order: number[]): void {
  if (order.length > 48) {
    order.sort(compareCrossings);
    return;
  }
  for (let i = 1; i < order.length; i += 1) {
    const item = order[i] as number;
    let j = i - 1;
    while (j >= 0 && compareCrossings(order[j] as number, item) > 0) {
      order[j + 1] = order[j] as number;
      j -= 1;
    }
    order[j + 1] = item;
  }
}

/** Pairs crossings into inside stretches, joins chains into parts, and finds side seams. */
export function finishScan(buffers: ScanBuffers, lines: ArrayLike<number>): void {
  scan = buffers;
  const order = scan.crossOrder;
  order.length = scan.crossCount;
  for (let k = 0; k < scan.crossCount; k += 1) order[k] = k;
  sortCrossings(order);
  for (let k = 0; k + 1 < order.length; k += 2)
    union(
      scan.crossChain[order[k] as number] as number,
      scan.crossChain[order[k + 1] as number] as number,
    );
  collectParts();
  if (lines.length > 2) collectSeams(order);
}
