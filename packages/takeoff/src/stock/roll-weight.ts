import { heavyRollCaution } from '../cautions/caution-texts.js';
import type { Caution } from '../cautions/caution-texts.js';

/**
 * Turf weighs about 0.4–1.0 lb per sq ft before infill (TRADE.md §1, [S15]); stock records do
 * not carry the face weight, so the caution uses the light end: the real roll is at least this.
 */
export const LIGHTEST_TURF_LB_PER_SQ_FT = 0.4;

/** NIOSH recommended weight limit for an ideal two-hand lift, as cited by OSHA. */
const NIOSH_LIFT_LIMIT_LB = 51;

/** The least a roll of this size weighs (lb), from the light end of turf weights. */
export function rollWeightLb(
  widthFt: number,
  lengthFt: number,
  lbPerSqFt = LIGHTEST_TURF_LB_PER_SQ_FT,
): number {
  return widthFt * lengthFt * lbPerSqFt;
}

/**
 * The heavy-roll caution for the screens where rolls are received, moved and cut: shown when
 * the heaviest roll listed is over the one-person lift limit even at the light end of turf
 * weights; empty otherwise.
 */
export function rollHandlingCautions(
  rolls: readonly { readonly widthFt: number; readonly lengthFt: number }[],
  liftLimitLb = NIOSH_LIFT_LIMIT_LB,
): Caution[] {
  const heaviest = Math.max(0, ...rolls.map((r) => rollWeightLb(r.widthFt, r.lengthFt)));
  return heaviest > liftLimitLb ? [heavyRollCaution(heaviest, liftLimitLb, 'listed')] : [];
}
