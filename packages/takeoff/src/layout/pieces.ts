import { fromFrame } from '../geometry/grain-frame.js';
import type { FrameCut } from './cuts.js';
import type { AngleLayout } from './plan-at-angle.js';
import { roundFt, roundPoint } from './rounding.js';
import type { LayoutCut, LayoutPiece } from './types.js';

/**
 * Pieces to buy and cuts to lay for a chosen layout. Without offcut reuse every cut is its
 * own piece; with it, the packing says which piece each cut comes from and where.
 */
export function piecesAndCuts(layout: AngleLayout): { pieces: LayoutPiece[]; cuts: LayoutCut[] } {
  const { rules, polygon } = layout.context;
  const { cuts: frameCuts, packing } = layout.candidate;
  const firstBand = Math.min(...frameCuts.map((cut) => cut.band));
  const pieces: LayoutPiece[] = packing
    ? packing.pieceUnits.map((units) => ({
        widthFt: rules.widthFt,
        lengthFt: roundFt(units * rules.stepFt),
      }))
    : frameCuts.map((cut) => ({
        widthFt: rules.widthFt,
        lengthFt: roundFt(cut.units * rules.stepFt),
      }));
  const cuts = frameCuts.map((cut: FrameCut, index): LayoutCut => {
    const placement = packing?.placements[index];
    const uEnd = cut.uMin + cut.acrossFt;
    const vEnd = cut.vStart + cut.units * rules.stepFt;
    const corner = (pu: number, pv: number): [number, number] =>
      roundPoint(fromFrame(polygon.frame, pu, pv));
    return {
      piece: placement ? placement.piece : index,
      alongFt: roundFt(cut.units * rules.stepFt),
      acrossFt: roundFt(cut.acrossFt),
      corners: [
        corner(cut.uMin, cut.vStart),
        corner(uEnd, cut.vStart),
        corner(uEnd, vEnd),
        corner(cut.uMin, vEnd),
      ],
      strip: cut.band - firstBand,
      acrossOffsetFt: roundFt(placement ? placement.acrossOffsetFt : 0),
      alongOffsetFt: roundFt(placement ? placement.alongOffsetUnits * rules.stepFt : 0),
    };
  });
  return { pieces, cuts };
}
