import { formatNumber } from '../units/format-length.js';

/** One safety caution shown in the caution panel, in Seamwright's own words. */
export interface Caution {
  key:
    | 'utility-locate'
    | 'silica-dust'
    | 'heavy-rolls'
    | 'turf-heat'
    | 'playground-fall-height'
    | 'pets-perimeter';
  title: string;
  body: string;
  /** The closing pointer to local codes and licensed practice; every caution carries it. */
  deferral: typeof DEFER_TO_LOCAL_PRACTICE;
  /** Where the facts come from, so a reader can check them. */
  reference: string;
}

/** Every caution ends with this: the tool does not replace local rules or licensed practice. */
export const DEFER_TO_LOCAL_PRACTICE =
  'Follow local codes and licensing rules, the manufacturer’s written instructions and licensed professional practice; this note is not legal or engineering advice.';

/** Digging for the base: locate request, waiting period, hand-dig zone. */
export const utilityLocateCaution: Caution = {
  key: 'utility-locate',
  title: 'Call 811 before digging',
  body: 'Removing sod and digging for the base can hit buried power, gas, water and data lines. Place a locate request through 811 and do not dig until your state’s legal waiting period has passed and every operator has answered; keep the ticket current if the job slips. Within the tolerance zone around each mark (18 to 30 in either side, by state) expose lines with hand tools only, and stop and call the operator after any contact.',
  deferral: DEFER_TO_LOCAL_PRACTICE,
  reference: 'State one-call (811) law; Common Ground Alliance Best Practice 5.19 (tolerance zone)',
};

/** Spreading silica-based infill. */
export const silicaDustCaution: Caution = {
  key: 'silica-dust',
  title: 'Silica dust when spreading sand infill',
  body: 'Kiln-dried sand infill is handled dry and can put respirable crystalline silica in the air. Pour from a low height with a drop spreader, work upwind of the spreader, and read the product’s safety data sheet. Do not dry-sweep or dry-brush where it adds to exposure, and do not blow off clothes or surfaces with compressed air. Wear a respirator unless exposure is known to stay below the action level.',
  deferral: DEFER_TO_LOCAL_PRACTICE,
  reference:
    'OSHA 29 CFR 1926.1153 (respirable crystalline silica in construction), including (f) housekeeping',
};

/** Rolls above the one-person lift limit. */
export function heavyRollCaution(
  rollWeightLb: number,
  liftLimitLb: number,
  /** Whose heaviest roll: "on this job" for a plan, "listed" for the stock screens. */
  where = 'on this job',
): Caution {
  return {
    key: 'heavy-rolls',
    title: 'Heavy rolls: lift with a machine or a team',
    body: `The heaviest roll ${where} weighs about ${formatNumber(rollWeightLb, 0)} lb, above the ${liftLimitLb} lb recommended limit for one person lifting with two hands in ideal conditions. Move it with a roll cart, or a carpet pole on a skid-steer or forklift, and plan team lifts for anything carried by hand.`,
    deferral: DEFER_TO_LOCAL_PRACTICE,
    reference: 'NIOSH recommended weight limit (51 lb) for two-hand lifting, as cited by OSHA',
  };
}

/** Surface heat of synthetic turf in sun. */
export const turfHeatCaution: Caution = {
  key: 'turf-heat',
  title: 'Turf gets very hot in the sun',
  body: 'Field measurements have found synthetic turf in full sun far hotter than natural grass, at times above 150 °F at the surface. Crews kneel on it all day: use knee pads and gloves, plan heavy work for cooler hours, and tell the owner that watering cools the surface only briefly.',
  deferral: DEFER_TO_LOCAL_PRACTICE,
  reference: 'Published university field studies of synthetic-turf surface temperature',
};

/** Turf under play equipment. */
export const playgroundFallHeightCaution: Caution = {
  key: 'playground-fall-height',
  title: 'Play areas: the shock pad gives the fall protection',
  body: 'Under play equipment the shock pad, not the infill, absorbs a fall. Use a tested system whose critical height is at least the fall height of the equipment, and build it exactly as tested — changing the base, pad, turf or infill voids the rating. Keep the surfacing across the whole use zone around each piece of equipment.',
  deferral: DEFER_TO_LOCAL_PRACTICE,
  reference:
    'ASTM F1292 (impact attenuation, critical height); CPSC Public Playground Safety Handbook (Pub. 325)',
};

/** Dogs lifting edges. */
export const petsPerimeterCaution: Caution = {
  key: 'pets-perimeter',
  title: 'Pets: secure the whole perimeter',
  body: 'Dogs dig at and pull loose edges. Fasten the turf along every edge (screwed to a board or nailed closely), keep the backing permeable, avoid crumb rubber infill, and give the owner rinsing and cleaning instructions.',
  deferral: DEFER_TO_LOCAL_PRACTICE,
  reference: 'Common practice in pet turf installation (no published standard)',
};
