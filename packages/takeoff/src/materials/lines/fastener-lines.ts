import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import {
  ceilWhole,
  fastenersForClosedLoop,
  fastenersForOpenRun,
  stockPieces,
} from '../formulas.js';
import { n, plural } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import type { EdgePlan } from './edge-plan.js';
import { makeLine } from './make-line.js';

/** Perimeter nails: ceil(feet × 12 ÷ spacing) for straight runs, and again at curve spacing. */
export function perimeterNailLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
  edges: EdgePlan,
): TakeoffLine[] {
  if (edges.nailedFt <= 0) return [];
  const { straightSpacingIn, curveSpacingIn } = settings.perimeterNails;
  const straightFt = edges.nailedFt - edges.curvedNailedFt;
  const straight = fastenersForClosedLoop(straightFt, straightSpacingIn);
  const curved = fastenersForClosedLoop(edges.curvedNailedFt, curveSpacingIn);
  const straightText = `${n(straightFt)} lf straight × 12 ÷ ${n(straightSpacingIn)} in = ${n(straight)}`;
  const where =
    edges.nailedFt === input.perimeterFt ? 'closed perimeter' : 'nailed part of the perimeter';
  const rule =
    edges.curvedNailedFt > 0
      ? `${where}: ${straightText} + ${n(edges.curvedNailedFt)} lf curved × 12 ÷ ${n(curveSpacingIn)} in = ${n(curved)} → ${n(straight + curved)} nails`
      : `${where}: ${straightText} nails`;
  return [
    makeLine({
      key: 'perimeter-nails',
      kind: 'material',
      label: 'Perimeter nails',
      quantity: straight + curved,
      unit: 'ea',
      rawQuantity:
        (straightFt * 12) / straightSpacingIn + (edges.curvedNailedFt * 12) / curveSpacingIn,
      rule,
      rounding: 'each run rounded up to a whole nail',
      inputs: {
        nailedFt: edges.nailedFt,
        curvedFt: edges.curvedNailedFt,
        straightSpacingIn,
        curveSpacingIn,
      },
    }),
  ];
}

/** Seam nails on both sides of every seam, or none when the company glues seams only. */
export function seamNailLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const { isNailed, offsetIn, spacingIn } = settings.seamNails;
  const seamFt = input.seams.sideFt + input.seams.buttFt;
  if (!isNailed || seamFt <= 0) return [];
  // Each seam is an open run, so each side gets one extra nail at the seam's end.
  const perSide = ceilWhole((seamFt * 12) / spacingIn) + input.seams.count;
  return [
    makeLine({
      key: 'seam-nails',
      kind: 'material',
      label: 'Seam nails',
      quantity: perSide * 2,
      unit: 'ea',
      rawQuantity: 2 * ((seamFt * 12) / spacingIn + input.seams.count),
      rule: `2 sides × (${n(seamFt)} lf of seam × 12 ÷ ${n(spacingIn)} in + ${plural(input.seams.count, 'seam end', 'seam ends')}) = ${n(perSide * 2)} nails, each about ${n(offsetIn)} in from the seam`,
      rounding: 'rounded up to whole nails per side',
      inputs: { seamFt, seamCount: input.seams.count, spacingIn, offsetIn },
    }),
  ];
}

/** Edging / bender board along edges that meet beds or lawn, with stakes, and staples if used. */
export function edgingLines(settings: TakeoffSettings, edges: EdgePlan): TakeoffLine[] {
  if (edges.edgingFt <= 0) return [];
  const { stockLengthFt, wastePercent, stakeSpacingIn, tags } = settings.edging;
  const boards = stockPieces(edges.edgingFt, stockLengthFt, wastePercent);
  const stakes = fastenersForOpenRun(edges.edgingFt, stakeSpacingIn);
  const lines = [
    makeLine({
      key: 'edging',
      kind: 'material',
      label: 'Edging / bender board',
      quantity: boards,
      unit: 'boards',
      rawQuantity: (edges.edgingFt * (1 + wastePercent / 100)) / stockLengthFt,
      rule: `${n(edges.edgingFt)} lf of edges meeting ${tags.join(' or ')} × (1 + ${n(wastePercent)} % waste) ÷ ${n(stockLengthFt)} ft boards = ${n(boards)} boards`,
      rounding: 'rounded up to whole boards',
      inputs: { edgingFt: edges.edgingFt, stockLengthFt, wastePercent },
    }),
    makeLine({
      key: 'edging-stakes',
      kind: 'material',
      label: 'Edging stakes',
      quantity: stakes,
      unit: 'ea',
      rawQuantity: (edges.edgingFt * 12) / stakeSpacingIn + 1,
      rule: `${n(edges.edgingFt)} lf × 12 ÷ ${n(stakeSpacingIn)} in + 1 at the end = ${n(stakes)} stakes`,
      rounding: 'rounded up to whole stakes',
      inputs: { edgingFt: edges.edgingFt, stakeSpacingIn },
    }),
  ];
  if (edges.stapledFt > 0) {
    const { spacingIn } = settings.staples;
    const staples = fastenersForClosedLoop(edges.stapledFt, spacingIn);
    lines.push(
      makeLine({
        key: 'edging-staples',
        kind: 'material',
        label: 'Staples into edging',
        quantity: staples,
        unit: 'ea',
        rawQuantity: (edges.stapledFt * 12) / spacingIn,
        rule: `${n(edges.stapledFt)} lf × 12 ÷ ${n(spacingIn)} in = ${n(staples)} staples`,
        rounding: 'rounded up to whole staples',
        inputs: { stapledFt: edges.stapledFt, spacingIn },
      }),
    );
  }
  return lines;
}

/** Pet perimeter: treated boards in stock lengths with waste, turf screwed every N in. */
export function petPerimeterLines(settings: TakeoffSettings, edges: EdgePlan): TakeoffLine[] {
  if (edges.petBoardFt <= 0) return [];
  const { boardLabel, stockLengthFt, wastePercent, screwSpacingIn, skippedTags } =
    settings.petPerimeter;
  const boards = stockPieces(edges.petBoardFt, stockLengthFt, wastePercent);
  const screws = fastenersForClosedLoop(edges.petBoardFt, screwSpacingIn);
  const skipped =
    skippedTags.length > 0 ? ` (edges meeting ${skippedTags.join(' or ')} skipped)` : '';
  return [
    makeLine({
      key: 'pet-perimeter-boards',
      kind: 'material',
      label: `Pet perimeter: ${boardLabel}`,
      quantity: boards,
      unit: 'boards',
      rawQuantity: (edges.petBoardFt * (1 + wastePercent / 100)) / stockLengthFt,
      rule: `${n(edges.petBoardFt)} lf${skipped} × (1 + ${n(wastePercent)} % waste) ÷ ${n(stockLengthFt)} ft stock = ${n(boards)} boards`,
      rounding: 'rounded up to whole boards',
      inputs: { boardFt: edges.petBoardFt, stockLengthFt, wastePercent },
    }),
    makeLine({
      key: 'pet-perimeter-screws',
      kind: 'material',
      label: 'Pet perimeter screws',
      quantity: screws,
      unit: 'ea',
      rawQuantity: (edges.petBoardFt * 12) / screwSpacingIn,
      rule: `${n(edges.petBoardFt)} lf × 12 ÷ ${n(screwSpacingIn)} in = ${n(screws)} screws`,
      rounding: 'rounded up to whole screws',
      inputs: { boardFt: edges.petBoardFt, screwSpacingIn },
    }),
  ];
}
