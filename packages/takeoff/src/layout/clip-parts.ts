import * as polygonClippingModule from 'polygon-clipping';
import type { MultiPolygon, Polygon } from 'polygon-clipping';
import { SLIVER_FT } from './band-scan.js';
import type { BandPart } from './band-scan.js';
import { framePairs } from './frame-polygon.js';
import type { FramePolygon } from './frame-polygon.js';

// polygon-clipping ships its functions as one default export object, while its type file
// declares named exports; take whichever this loader (tsx, vitest) hands us.
const polygonClipping =
  (polygonClippingModule as unknown as { default?: typeof polygonClippingModule }).default ??
  polygonClippingModule;

/** A part from polygon clipping: its extents and its outline (for butt-seam lines). */
export interface ClippedPart extends BandPart {
  readonly polygon: Polygon;
}

function bandRectangle(polygon: FramePolygon, left: number, right: number): Polygon {
  const bottom = polygon.vMin - 1;
  const top = polygon.vMax + 1;
  return [
    [
      [left, bottom],
      [right, bottom],
      [right, top],
      [left, top],
    ],
  ];
}

function partOf(band: number, piece: Polygon): ClippedPart {
  let uMin = Infinity;
  let uMax = -Infinity;
  let vMin = Infinity;
  let vMax = -Infinity;
  for (const [pu, pv] of piece[0] ?? []) {
    uMin = Math.min(uMin, pu);
    uMax = Math.max(uMax, pu);
    vMin = Math.min(vMin, pv);
    vMax = Math.max(vMax, pv);
  }
  return { band, uMin, uMax, vMin, vMax, polygon: piece };
}

/**
 * The connected parts of the area in each strip, by polygon clipping (the library is the
 * reference for the final layout; the fast scan only screens). Strips are clipped in two
 * batches, even and odd, so that no two strips of one batch touch and merge.
 */
export function clipParts(polygon: FramePolygon, lines: readonly number[]): ClippedPart[] {
  const parts: ClippedPart[] = [];
  const area = framePairs(polygon);
  for (const parity of [0, 1]) {
    const bands: number[] = [];
    for (let band = parity; band + 1 < lines.length; band += 2) bands.push(band);
    if (bands.length === 0) continue;
    const strips: MultiPolygon = bands.map((band) =>
      bandRectangle(polygon, lines[band] as number, lines[band + 1] as number),
    );
    const clipped = polygonClipping.intersection(area, strips);
    for (const piece of clipped) {
      const centre = partOf(0, piece);
      const middle = (centre.uMin + centre.uMax) / 2;
      const band =
        bands.find((b) => (lines[b] as number) <= middle && middle <= (lines[b + 1] as number)) ??
        0;
      parts.push({ ...centre, band });
    }
  }
  return parts
    .filter((part) => part.uMax - part.uMin >= SLIVER_FT && part.vMax - part.vMin >= SLIVER_FT)
    .sort((a, b) => a.band - b.band || a.vMin - b.vMin || a.uMin - b.uMin);
}
