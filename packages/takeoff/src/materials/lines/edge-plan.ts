import type { PerimeterTag, TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';

/** How the perimeter is held down, in feet per method. */
export interface EdgePlan {
  /** Nailed into the base (straight + curved). */
  nailedFt: number;
  curvedNailedFt: number;
  /** Runs that get edging / bender board. */
  edgingFt: number;
  /** Edging runs where the turf is stapled to the board instead of nailed. */
  stapledFt: number;
  /** Runs with a treated board the turf is screwed to (pets). */
  petBoardFt: number;
  isPetPerimeter: boolean;
}

function taggedFeet(input: NormalisedTakeoffInput, tags: readonly PerimeterTag[]): number {
  return [...new Set(tags)].reduce((sum, tag) => sum + (input.perimeterByTagFt[tag] ?? 0), 0);
}

/**
 * Splits the perimeter between fastening methods. With pets, every edge except the skipped tags
 * (hard surfaces, house walls by default) gets a screwed board, which also serves as edging.
 * Otherwise edges tagged for edging get board (stapled if the company staples) and every other
 * foot is nailed into the base. Curved feet are nailed at the closer curve spacing.
 */
export function planEdges(input: NormalisedTakeoffInput, settings: TakeoffSettings): EdgePlan {
  const perimeter = input.perimeterFt;
  const isPetPerimeter = input.usage === 'pet' || input.hasPets;
  let petBoardFt = 0;
  let edgingFt = 0;
  let stapledFt = 0;
  if (isPetPerimeter) {
    petBoardFt = Math.max(0, perimeter - taggedFeet(input, settings.petPerimeter.skippedTags));
  } else {
    edgingFt = Math.min(perimeter, taggedFeet(input, settings.edging.tags));
    stapledFt = settings.staples.isUsedOnEdging ? edgingFt : 0;
  }
  const nailedFt = Math.max(0, perimeter - petBoardFt - stapledFt);
  return {
    nailedFt,
    curvedNailedFt: Math.min(input.curvedPerimeterFt, nailedFt),
    edgingFt,
    stapledFt,
    petBoardFt,
    isPetPerimeter,
  };
}
