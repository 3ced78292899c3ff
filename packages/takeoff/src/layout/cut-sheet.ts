import { bearingOf, compassLetters, compassWord } from '../geometry/compass.js';
import { boundingBox } from '../geometry/ring.js';
import type { Point } from '../geometry/types.js';
import type { AngleLayout } from './plan-at-angle.js';
import { roundFt } from './rounding.js';
import type { CutSheetEntry, GrainArrow, LayoutCut, LayoutPiece } from './types.js';

/** Grain arrow for a grain direction (degrees CCW from east). */
export function grainArrow(angleDeg: number): GrainArrow {
  return { angleDeg, bearingDeg: roundFt(bearingOf(angleDeg)), compass: compassLetters(angleDeg) };
}

function feet(value: number): string {
  return String(Math.round(value * 10) / 10);
}

/** "north-west" style position of a point within the area's bounding box (thirds). */
function positionWord(point: Point, outer: readonly Point[]): string {
  const box = boundingBox([outer]);
  const third = (value: number, low: number, high: number): number =>
    high - low < 1e-9 ? 1 : Math.min(2, Math.floor(((value - low) / (high - low)) * 3));
  const column = third(point[0], box.minX, box.maxX);
  const row = third(point[1], box.minY, box.maxY);
  const ns = ['south', '', 'north'][row] as string;
  const ew = ['west', '', 'east'][column] as string;
  return ns && ew ? `${ns}-${ew}` : ns || ew || 'center';
}

/**
 * Cut sheet: one entry per piece with the roll length to cut, the cuts it yields (where
 * across and along the piece), where each goes in the yard in words, and the grain arrow.
 */
export function cutSheetOf(
  layout: AngleLayout,
  pieces: readonly LayoutPiece[],
  cuts: readonly LayoutCut[],
  outer: readonly Point[],
  grainAngleDeg: number,
): CutSheetEntry[] {
  const { polygon } = layout.context;
  const across = polygon.frame.angleDeg + 90; // the edge strips are measured from: opposite the across axis
  const edgeWord = compassWord(across);
  const frameCuts = layout.candidate.cuts;
  return pieces.map((piece, index) => ({
    piece: index,
    lengthFt: piece.lengthFt,
    widthFt: piece.widthFt,
    grainArrow: grainArrow(grainAngleDeg),
    cuts: cuts.flatMap((cut, cutIndex) => {
      if (cut.piece !== index) return [];
      const frameCut = frameCuts[cutIndex];
      const from = frameCut ? frameCut.uMin - polygon.uMin : 0;
      const centre: Point = [
        cut.corners.reduce((sum, c) => sum + c[0], 0) / 4,
        cut.corners.reduce((sum, c) => sum + c[1], 0) / 4,
      ];
      const position = positionWord(centre, outer);
      return [
        {
          cut: cutIndex,
          acrossFromFt: cut.acrossOffsetFt,
          acrossToFt: roundFt(cut.acrossOffsetFt + cut.acrossFt),
          alongFromFt: cut.alongOffsetFt,
          alongToFt: roundFt(cut.alongOffsetFt + cut.alongFt),
          goes: `${position}, ${feet(from)}–${feet(from + cut.acrossFt)} ft from the ${edgeWord} edge`,
          position,
          fromEdge: edgeWord,
          fromEdgeStartFt: roundFt(from),
          fromEdgeEndFt: roundFt(from + cut.acrossFt),
        },
      ];
    }),
  }));
}
