import type { AssignmentFigures } from './types.js';

/** Lengths are compared with this tolerance (sums of feet in different orders). */
export const FT_EPSILON = 1e-6;

/** Leftovers under 3 ft are hard to use in a seamed job (common practice, no published source). */
export const DEFAULT_SCRAP_BELOW_FT = 3;

/**
 * Default search nodes per dye lot: jobs of a few pieces are searched exhaustively well below
 * it, and a 40-piece job on three lots of ten rolls stays near 50 ms (README).
 */
export const DEFAULT_MAX_NODES_PER_LOT = 20_000;

/** Most pieces per product and rolls per request the search accepts (callers check first). */
export const MAX_RESERVATION_PIECES = 200;
export const MAX_RESERVATION_ROLLS = 2000;

function compareFt(a: number, b: number): number {
  return Math.abs(a - b) > FT_EPSILON ? a - b : 0;
}

/**
 * Orders two assignments, best first: least short, most from remnants, least scrap, least
 * trimmed off the side, fewest rolls cut. Returns < 0 when `a` is better.
 */
export function compareFigures(a: AssignmentFigures, b: AssignmentFigures): number {
  return (
    compareFt(a.shortFt, b.shortFt) ||
    compareFt(b.remnantFt, a.remnantFt) ||
    compareFt(a.scrapFt, b.scrapFt) ||
    compareFt(a.trimSqFt, b.trimSqFt) ||
    a.rollsCut - b.rollsCut
  );
}

/** A piece as the search sees it. */
export interface Piece {
  readonly widthFt: number;
  readonly lengthFt: number;
}

/** A roll as the search sees it. */
export interface Roll {
  readonly widthFt: number;
  readonly availableFt: number;
  readonly isRemnant: boolean;
}

/** Whether `roll` is wide enough for `piece` (a roll is never turned). */
export function isWideEnough(roll: Roll, piece: Piece): boolean {
  return roll.widthFt >= piece.widthFt - FT_EPSILON;
}

/**
 * The figures of a complete assignment: `choice[i]` is the roll index piece `i` is cut from,
 * or -1 for short. The caller guarantees every roll is wide and long enough.
 */
export function figuresOf(
  pieces: readonly Piece[],
  rolls: readonly Roll[],
  choice: readonly number[],
  scrapBelowFt: number,
): AssignmentFigures {
  const used = new Array<number>(rolls.length).fill(0);
  let shortFt = 0;
  let remnantFt = 0;
  let trimSqFt = 0;
  choice.forEach((r, i) => {
    const piece = pieces[i];
    if (!piece) return;
    const roll = r >= 0 ? rolls[r] : undefined;
    if (!roll) {
      shortFt += piece.lengthFt;
      return;
    }
    used[r] = (used[r] ?? 0) + piece.lengthFt;
    if (roll.isRemnant) remnantFt += piece.lengthFt;
    trimSqFt += (roll.widthFt - piece.widthFt) * piece.lengthFt;
  });
  let scrapFt = 0;
  let rollsCut = 0;
  rolls.forEach((roll, r) => {
    const taken = used[r] ?? 0;
    if (taken <= 0) return;
    rollsCut += 1;
    const left = roll.availableFt - taken;
    if (left > FT_EPSILON && left < scrapBelowFt - FT_EPSILON) scrapFt += left;
  });
  return { shortFt, remnantFt, scrapFt, trimSqFt, rollsCut };
}
