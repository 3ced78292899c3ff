import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import { ceilWhole, roundUpTo } from '../formulas.js';
import { n } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { makeLine } from './make-line.js';

/** Seam tape rolls and seam adhesive, both from the total seam length (side + butt seams). */
export function seamLines(input: NormalisedTakeoffInput, settings: TakeoffSettings): TakeoffLine[] {
  const { sideFt, buttFt } = input.seams;
  const seamFt = sideFt + buttFt;
  if (seamFt <= 0) return [];
  const { rollLengthFt, widthIn } = settings.seamTape;
  const rolls = ceilWhole(seamFt / rollLengthFt);
  const { coverageLfPerGal, containerGal } = settings.adhesive;
  const gallons = seamFt / coverageLfPerGal;
  const seamText = `${n(sideFt)} lf side + ${n(buttFt)} lf butt = ${n(seamFt)} lf of seam`;
  return [
    makeLine({
      key: 'seam-tape',
      kind: 'material',
      label: `Seam tape (${n(widthIn)} in)`,
      quantity: rolls,
      unit: 'rolls',
      rawQuantity: seamFt / rollLengthFt,
      rule: `${seamText} ÷ ${n(rollLengthFt)} ft per roll = ${n(seamFt / rollLengthFt)} rolls`,
      rounding: 'rounded up to whole rolls',
      inputs: { sideSeamFt: sideFt, buttSeamFt: buttFt, rollLengthFt, widthIn },
    }),
    makeLine({
      key: 'seam-adhesive',
      kind: 'material',
      label: 'Seam adhesive',
      quantity: roundUpTo(gallons, containerGal),
      unit: 'gal',
      rawQuantity: gallons,
      rule: `${seamText} ÷ ${n(coverageLfPerGal)} lf per gal = ${n(gallons)} gal`,
      rounding: `rounded up to whole ${n(containerGal)} gal containers`,
      inputs: { seamFt, coverageLfPerGal, containerGal },
    }),
  ];
}
