import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import { roundTo, turfPieceWeightLb } from '../formulas.js';
import { n } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { makeLine } from './make-line.js';

function describePieces(pieces: NormalisedTakeoffInput['turf']['pieces']): string {
  const groups = new Map<string, number>();
  for (const piece of pieces) {
    const size = `${n(piece.widthFt)} × ${n(piece.lengthFt)} ft`;
    groups.set(size, (groups.get(size) ?? 0) + 1);
  }
  return [...groups].map(([size, count]) => `${count} × (${size})`).join(' + ');
}

/** The turf to order, from the layout plan's pieces. */
export function turfLines(input: NormalisedTakeoffInput): TakeoffLine[] {
  const { orderedSqFt, pieces } = input.turf;
  const waste = orderedSqFt - input.areaSqFt;
  const wastePct = orderedSqFt > 0 ? (waste / orderedSqFt) * 100 : 0;
  const source =
    pieces.length > 0
      ? `${describePieces(pieces)} = ${n(orderedSqFt)} sq ft ordered`
      : `${n(orderedSqFt)} sq ft ordered`;
  return [
    makeLine({
      key: 'turf',
      kind: 'material',
      label: 'Turf',
      quantity: orderedSqFt,
      unit: 'sq ft',
      rawQuantity: orderedSqFt,
      rule: `${source} for ${n(input.areaSqFt)} sq ft of area (${n(waste)} sq ft waste, ${n(wastePct, 1)} % of the order)`,
      rounding: 'none (the plan buys whole-width pieces)',
      inputs: { orderedSqFt, areaSqFt: input.areaSqFt, pieces: pieces.length },
    }),
  ];
}

/** The heaviest piece's weight (face + backing), flagged when above the one-person lift limit. */
export function rollWeightLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const face = input.turf.faceWeightOzPerSqYd;
  const heaviest = input.turf.pieces.reduce<{ widthFt: number; lengthFt: number } | undefined>(
    (best, piece) =>
      !best || piece.widthFt * piece.lengthFt > best.widthFt * best.lengthFt ? piece : best,
    undefined,
  );
  if (face === undefined || !heaviest) return [];
  const { latexBackingOzPerSqYd, polyurethaneBackingOzPerSqYd, assumedBacking, liftLimitLb } =
    settings.turfWeight;
  const backing = input.turf.backing ?? assumedBacking;
  const backingOz = backing === 'latex' ? latexBackingOzPerSqYd : polyurethaneBackingOzPerSqYd;
  const sqYd = (heaviest.widthFt * heaviest.lengthFt) / 9;
  const weight = turfPieceWeightLb(heaviest.widthFt, heaviest.lengthFt, face + backingOz);
  const assumed = input.turf.backing === undefined ? ' (assumed)' : '';
  return [
    makeLine({
      key: 'roll-weight',
      kind: 'guidance',
      label: 'Heaviest roll weight',
      quantity: Math.round(weight),
      unit: 'lb',
      rawQuantity: weight,
      rule: `${n(heaviest.widthFt)} × ${n(heaviest.lengthFt)} ft ÷ 9 = ${n(sqYd)} sq yd × (${n(face)} oz face + ${n(backingOz)} oz ${backing} backing${assumed}) ÷ 16 = ${n(weight)} lb`,
      rounding: 'to the nearest lb',
      inputs: {
        widthFt: heaviest.widthFt,
        lengthFt: heaviest.lengthFt,
        faceOzPerSqYd: face,
        backingOzPerSqYd: backingOz,
        backing,
        liftLimitLb,
      },
      warnings:
        weight > liftLimitLb
          ? [
              `At ${n(roundTo(weight, 0))} lb this roll is over the ${n(liftLimitLb)} lb one-person lift limit: use a roll cart, carpet pole on a machine or a team lift.`,
            ]
          : [],
    }),
  ];
}
