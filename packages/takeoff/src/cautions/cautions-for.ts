import type {
  InfillKind,
  TakeoffSettings,
  TakeoffUsage,
} from '../settings/takeoff-settings-schema.js';
import type { NormalisedTakeoffInput, TakeoffInput } from '../materials/takeoff-input.js';
import type { TakeoffLine } from '../materials/takeoff-line.js';
import {
  heavyRollCaution,
  petsPerimeterCaution,
  playgroundFallHeightCaution,
  silicaDustCaution,
  turfHeatCaution,
  utilityLocateCaution,
} from './caution-texts.js';
import type { Caution } from './caution-texts.js';

/** What the cautions depend on. */
export interface CautionContext {
  usage: TakeoffUsage;
  /** Infill materials the job spreads. */
  infillKinds: readonly InfillKind[];
  /** The job digs (sod removal, excavation for the base). */
  isDigging: boolean;
  /** Weight of the heaviest roll, when known. */
  rollWeightLb?: number;
  /** One-person lift limit; 51 lb (NIOSH, as cited by OSHA) unless the company sets another. */
  liftLimitLb?: number;
  hasPets?: boolean;
}

const SILICA_INFILL: ReadonlySet<InfillKind> = new Set(['silica-sand', 'coated-sand']);
const NIOSH_LIFT_LIMIT_LB = 51;

/**
 * The cautions that apply to a job, most urgent first: utility locate when digging, heavy
 * rolls, silica dust with sand infill, playground fall height, secured perimeter for pets, and
 * always surface heat. Each one ends by deferring to local codes, the manufacturer's written
 * instructions and licensed practice.
 */
export function cautionsFor(context: CautionContext): Caution[] {
  const cautions: Caution[] = [];
  if (context.isDigging) cautions.push(utilityLocateCaution);
  const limit = context.liftLimitLb ?? NIOSH_LIFT_LIMIT_LB;
  if (context.rollWeightLb !== undefined && context.rollWeightLb > limit)
    cautions.push(heavyRollCaution(context.rollWeightLb, limit));
  if (context.infillKinds.some((kind) => SILICA_INFILL.has(kind))) cautions.push(silicaDustCaution);
  if (context.usage === 'play') cautions.push(playgroundFallHeightCaution);
  if (context.usage === 'pet' || context.hasPets === true) cautions.push(petsPerimeterCaution);
  cautions.push(turfHeatCaution);
  return cautions;
}

/** The caution context for a computed takeoff: digging, infill kinds and roll weight come from it. */
export function cautionContextForTakeoff(
  input: TakeoffInput | NormalisedTakeoffInput,
  lines: readonly TakeoffLine[],
  settings: TakeoffSettings,
): CautionContext {
  const rollWeight = lines.find((line) => line.key === 'roll-weight')?.rawQuantity;
  return {
    usage: input.usage,
    infillKinds: settings.infill[input.usage].layers.map((layer) => layer.kind),
    isDigging: lines.some((line) => line.key === 'excavation-spoil'),
    ...(rollWeight === undefined ? {} : { rollWeightLb: rollWeight }),
    liftLimitLb: settings.turfWeight.liftLimitLb,
    hasPets: input.hasPets === true,
  };
}
