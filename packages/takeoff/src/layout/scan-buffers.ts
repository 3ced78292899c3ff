/**
 * Reusable scratch storage for the band scan. The scan runs tens of thousands of times per
 * free-direction plan, so it writes into typed arrays that grow on demand instead of
 * allocating objects; the results are read back right after each scan (single-threaded).
 */
export class ScanBuffers {
  chainCount = 0;
  chainBand = new Int32Array(64);
  chainRing = new Int32Array(64);
  chainParent = new Int32Array(64);
  chainULo = new Float64Array(64);
  chainUHi = new Float64Array(64);
  chainVLo = new Float64Array(64);
  chainVHi = new Float64Array(64);

  crossCount = 0;
  crossGroup = new Int32Array(64);
  crossV = new Float64Array(64);
  crossSlope = new Float64Array(64);
  crossChain = new Int32Array(64);
  crossOrder: number[] = [];

  partCount = 0;
  partBand = new Int32Array(32);
  partULo = new Float64Array(32);
  partUHi = new Float64Array(32);
  partVLo = new Float64Array(32);
  partVHi = new Float64Array(32);
  /** Scratch per chain: index of its part, or -1. */
  rootPart = new Int32Array(64);
  /** Scratch per chain: does its root touch a boundary? */
  rootCrossed = new Uint8Array(64);

  seamCount = 0;
  seamLine = new Int32Array(32);
  seamVLo = new Float64Array(32);
  seamVHi = new Float64Array(32);

  reset(): void {
    this.chainCount = 0;
    this.crossCount = 0;
    this.partCount = 0;
    this.seamCount = 0;
  }

  growChains(): void {
    const size = this.chainBand.length * 2;
    this.chainBand = grownInt(this.chainBand, size);
    this.chainRing = grownInt(this.chainRing, size);
    this.chainParent = grownInt(this.chainParent, size);
    this.chainULo = grownFloat(this.chainULo, size);
    this.chainUHi = grownFloat(this.chainUHi, size);
    this.chainVLo = grownFloat(this.chainVLo, size);
    this.chainVHi = grownFloat(this.chainVHi, size);
    this.rootPart = new Int32Array(size);
    this.rootCrossed = new Uint8Array(size);
  }

  growCrossings(): void {
    const size = this.crossGroup.length * 2;
    this.crossGroup = grownInt(this.crossGroup, size);
    this.crossV = grownFloat(this.crossV, size);
    this.crossSlope = grownFloat(this.crossSlope, size);
    this.crossChain = grownInt(this.crossChain, size);
  }

  growParts(): void {
    const size = this.partBand.length * 2;
    this.partBand = grownInt(this.partBand, size);
    this.partULo = grownFloat(this.partULo, size);
    this.partUHi = grownFloat(this.partUHi, size);
    this.partVLo = grownFloat(this.partVLo, size);
    this.partVHi = grownFloat(this.partVHi, size);
  }

  growSeams(): void {
    const size = this.seamLine.length * 2;
    this.seamLine = grownInt(this.seamLine, size);
    this.seamVLo = grownFloat(this.seamVLo, size);
    this.seamVHi = grownFloat(this.seamVHi, size);
  }
}

function grownInt(array: Int32Array, size: number): Int32Array<ArrayBuffer> {
  const next = new Int32Array(size);
  next.set(array);
  return next;
}

function grownFloat(array: Float64Array, size: number): Float64Array<ArrayBuffer> {
  const next = new Float64Array(size);
  next.set(array);
  return next;
}
