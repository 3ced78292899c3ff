import type { BandPart, BandScan, SideSeamSpan } from './band-scan.js';
import { SLIVER_FT } from './band-scan.js';

const MINUS = 0; // the crossing seen from the band left of the boundary
const PLUS = 1; // the crossing seen from the band right of the boundary

/**
 * Book-keeping for one band scan: ring chains per band with their extents, the points where
 * chains meet boundaries, and a union-find joining chains into connected parts.
 */
export class ChainSet {
  private readonly band: number[] = [];
  private readonly ring: number[] = [];
  private readonly parent: number[] = [];
  private readonly uLo: number[] = [];
  private readonly uHi: number[] = [];
  private readonly vLo: number[] = [];
  private readonly vHi: number[] = [];
  private readonly crossGroup: number[] = [];
  private readonly crossV: number[] = [];
  private readonly crossSlope: number[] = [];
  private readonly crossChain: number[] = [];

  constructor(private readonly lines: ArrayLike<number>) {}

  /** Starts a chain inside band `band` belonging to ring `ring`. */
  open(band: number, ring: number): number {
    const id = this.band.length;
    this.band.push(band);
    this.ring.push(ring);
    this.parent.push(id);
    this.uLo.push(Infinity);
    this.uHi.push(-Infinity);
    this.vLo.push(Infinity);
    this.vHi.push(-Infinity);
    return id;
  }

  /** Grows a chain's extents to include a point. */
  extend(chain: number, pu: number, pv: number): void {
    if (pu < (this.uLo[chain] as number)) this.uLo[chain] = pu;
    if (pu > (this.uHi[chain] as number)) this.uHi[chain] = pu;
    if (pv < (this.vLo[chain] as number)) this.vLo[chain] = pv;
    if (pv > (this.vHi[chain] as number)) this.vHi[chain] = pv;
  }

  private cross(line: number, side: number, pv: number, slope: number, chain: number): void {
    this.crossGroup.push(line * 2 + side);
    this.crossV.push(pv);
    this.crossSlope.push(slope);
    this.crossChain.push(chain);
    this.extend(chain, this.lines[line] as number, pv);
  }

  /**
   * Follows edge p→q from zone `zoneP` to a different zone `zoneQ`, closing the current chain,
   * adding one chain per band crossed whole, and opening the chain q lies in (if any).
   * Returns the chain that is current at q (or -1 when q lies on a boundary).
   */
  crossEdge(
    p: number,
    q: number,
    zoneP: number,
    zoneQ: number,
    current: number,
    u: Float64Array,
    v: Float64Array,
    ring: number,
  ): number {
    const up = u[p] as number;
    const vp = v[p] as number;
    const uq = u[q] as number;
    const vq = v[q] as number;
    const slope = (vq - vp) / (uq - up);
    const vAt = (line: number): number => {
      const at = this.lines[line] as number;
      if (at === up) return vp;
      if (at === uq) return vq;
      return vp + ((at - up) / (uq - up)) * (vq - vp);
    };
    const rightward = zoneQ > zoneP;
    // Leave the band p is inside, if any.
    if (zoneP % 2 === 1) {
      const bandP = (zoneP - 1) / 2;
      const exitLine = rightward ? bandP + 1 : bandP;
      this.cross(exitLine, rightward ? MINUS : PLUS, vAt(exitLine), slope, current);
    }
    // Bands the edge crosses whole, from one boundary to the next.
    const low = rightward ? Math.floor(zoneP / 2) + (zoneP % 2) : Math.floor(zoneQ / 2) + (zoneQ % 2);
    const high = rightward ? Math.floor(zoneQ / 2) - 1 : Math.floor(zoneP / 2) - 1;
    for (let band = low; band <= high; band += 1) {
      const chain = this.open(band, ring);
      this.cross(band, PLUS, vAt(band), slope, chain);
      this.cross(band + 1, MINUS, vAt(band + 1), slope, chain);
    }
    if (zoneQ % 2 === 0) return -1;
    const bandQ = (zoneQ - 1) / 2;
    const chain = this.open(bandQ, ring);
    const entryLine = rightward ? bandQ : bandQ + 1;
    this.cross(entryLine, rightward ? PLUS : MINUS, vAt(entryLine), slope, chain);
    return chain;
  }

  /** Joins two chains into one part. */
  union(a: number, b: number): void {
    const rootA = this.find(a);
    const rootB = this.find(b);
    if (rootA !== rootB) this.parent[Math.max(rootA, rootB)] = Math.min(rootA, rootB);
  }

  private find(a: number): number {
    let root = a;
    while (this.parent[root] !== root) root = this.parent[root] as number;
    let node = a;
    while (node !== root) {
      const next = this.parent[node] as number;
      this.parent[node] = root;
      node = next;
    }
    return root;
  }

  /** Pairs boundary crossings into inside stretches, joins chains, and lists parts and seams. */
  finish(): BandScan {
    const order = this.crossV.map((_, i) => i).sort((i, j) => this.compareCrossings(i, j));
    const stretches = new Map<number, [number, number][]>();
    for (let k = 0; k + 1 < order.length; k += 2) {
      const a = order[k] as number;
      const b = order[k + 1] as number;
      this.union(this.crossChain[a] as number, this.crossChain[b] as number);
      const group = this.crossGroup[a] as number;
      const list = stretches.get(group) ?? [];
      list.push([this.crossV[a] as number, this.crossV[b] as number]);
      stretches.set(group, list);
    }
    return { parts: this.collectParts(), sideSeams: this.collectSeams(stretches) };
  }

  private compareCrossings(i: number, j: number): number {
    const group = (this.crossGroup[i] as number) - (this.crossGroup[j] as number);
    if (group !== 0) return group;
    const dv = (this.crossV[i] as number) - (this.crossV[j] as number);
    if (dv !== 0) return dv;
    // Same point on the boundary: order as seen a hair inside the band.
    const ds = (this.crossSlope[i] as number) - (this.crossSlope[j] as number);
    return (this.crossGroup[i] as number) % 2 === PLUS ? ds : -ds;
  }

  private collectParts(): BandPart[] {
    const hasCrossing = new Set(this.crossChain.map((chain) => this.find(chain)));
    const roots = new Map<number, { band: number; uMin: number; uMax: number; vMin: number; vMax: number }>();
    for (let chain = 0; chain < this.band.length; chain += 1) {
      const root = this.find(chain);
      // A chain with no boundary crossing is a whole ring inside one band: the outer ring
      // (the whole area fits in one strip) is a part; a hole is inside some part already.
      if (!hasCrossing.has(root) && this.ring[root] !== 0) continue;
      const part = roots.get(root) ?? { band: this.band[root] as number, uMin: Infinity, uMax: -Infinity, vMin: Infinity, vMax: -Infinity };
      part.uMin = Math.min(part.uMin, this.uLo[chain] as number);
      part.uMax = Math.max(part.uMax, this.uHi[chain] as number);
      part.vMin = Math.min(part.vMin, this.vLo[chain] as number);
      part.vMax = Math.max(part.vMax, this.vHi[chain] as number);
      roots.set(root, part);
    }
    return [...roots.values()]
      .filter((part) => part.uMax - part.uMin >= SLIVER_FT && part.vMax - part.vMin >= SLIVER_FT)
      .sort((a, b) => a.band - b.band || a.vMin - b.vMin || a.uMin - b.uMin);
  }

  private collectSeams(stretches: Map<number, [number, number][]>): SideSeamSpan[] {
    const seams: SideSeamSpan[] = [];
    for (let line = 1; line + 1 < this.lines.length; line += 1) {
      const left = stretches.get(line * 2 + MINUS) ?? [];
      const right = stretches.get(line * 2 + PLUS) ?? [];
      let i = 0;
      let j = 0;
      while (i < left.length && j < right.length) {
        const [a0, a1] = left[i] as [number, number];
        const [b0, b1] = right[j] as [number, number];
        const from = Math.max(a0, b0);
        const to = Math.min(a1, b1);
        if (to - from >= SLIVER_FT) seams.push({ line, u: this.lines[line] as number, vFrom: from, vTo: to });
        if (a1 < b1) i += 1;
        else j += 1;
      }
    }
    return seams;
  }
}
