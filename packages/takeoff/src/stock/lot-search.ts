// Branch and bound for one dye lot: every piece goes to one roll of the lot (wide and long
// enough) or is left short, ranked by compareFigures. Pieces are tried longest first; the
// incumbent starts from a greedy fit so there is always an answer when the work limit hits.
import type { AssignmentFigures } from './types.js';
import { compareFigures, figuresOf, FT_EPSILON, isWideEnough } from './figures.js';
import type { Piece, Roll } from './figures.js';

export interface LotSearchResult {
  /** `choice[i]`: the index into `rolls` piece `i` is cut from, or -1 when short. */
  readonly choice: readonly number[];
  readonly figures: AssignmentFigures;
  readonly isExhaustive: boolean;
}

/** Pieces longest first (then widest, then as given), so the search fills rolls tightly. */
function searchOrder(pieces: readonly Piece[]): number[] {
  return pieces
    .map((_, i) => i)
    .sort((a, b) => {
      const pa = pieces[a] as Piece;
      const pb = pieces[b] as Piece;
      return pb.lengthFt - pa.lengthFt || pb.widthFt - pa.widthFt || a - b;
    });
}

/** Remnants first, narrowest, shortest: the order greedy and the search try rolls in. */
function rollOrder(rolls: readonly Roll[]): number[] {
  return rolls
    .map((_, i) => i)
    .sort((a, b) => {
      const ra = rolls[a] as Roll;
      const rb = rolls[b] as Roll;
      return (
        Number(rb.isRemnant) - Number(ra.isRemnant) ||
        ra.widthFt - rb.widthFt ||
        ra.availableFt - rb.availableFt ||
        a - b
      );
    });
}

function sameRoll(a: Roll, b: Roll): boolean {
  return (
    a.isRemnant === b.isRemnant &&
    Math.abs(a.widthFt - b.widthFt) <= FT_EPSILON &&
    Math.abs(a.availableFt - b.availableFt) <= FT_EPSILON
  );
}

/** Greedy start: each piece (longest first) to the fitting roll in roll order, else short. */
function greedy(pieces: readonly Piece[], rolls: readonly Roll[], order: number[], by: number[]) {
  const left = rolls.map((r) => r.availableFt);
  const choice = new Array<number>(pieces.length).fill(-1);
  for (const i of order) {
    const piece = pieces[i] as Piece;
    const r = by.find(
      (j) => isWideEnough(rolls[j] as Roll, piece) && (left[j] ?? 0) >= piece.lengthFt - FT_EPSILON,
    );
    if (r === undefined) continue;
    choice[i] = r;
    left[r] = (left[r] ?? 0) - piece.lengthFt;
  }
  return choice;
}

/**
 * The best assignment of `pieces` to `rolls` (one lot). Exhaustive up to `maxNodes` search
 * nodes; past it the best found so far is returned with `isExhaustive: false`.
 */
export function searchLot(
  pieces: readonly Piece[],
  rolls: readonly Roll[],
  scrapBelowFt: number,
  maxNodes: number,
): LotSearchResult {
  const order = searchOrder(pieces);
  const by = rollOrder(rolls);
  let bestChoice = greedy(pieces, rolls, order, by);
  let best = figuresOf(pieces, rolls, bestChoice, scrapBelowFt);
  const left = rolls.map((r) => r.availableFt);
  const touched = new Array<boolean>(rolls.length).fill(false);
  const choice = new Array<number>(pieces.length).fill(-1);
  // Suffix sums of the remaining pieces' length, in search order.
  const remainingFt = new Array<number>(order.length + 1).fill(0);
  for (let k = order.length - 1; k >= 0; k -= 1)
    remainingFt[k] = (remainingFt[k + 1] ?? 0) + (pieces[order[k] as number] as Piece).lengthFt;
  let nodes = 0;
  let isExhaustive = true;

  let freeFt = 0;
  let freeRemnantFt = 0;
  for (const roll of rolls) {
    freeFt += roll.availableFt;
    if (roll.isRemnant) freeRemnantFt += roll.availableFt;
  }
  const take = (j: number, roll: Roll, ft: number): void => {
    left[j] = (left[j] ?? 0) - ft;
    freeFt -= ft;
    if (roll.isRemnant) freeRemnantFt -= ft;
  };
  /** Whether the subtree at depth k cannot beat the best: bounds on short and remnant feet. */
  const isHopeless = (k: number, shortFt: number, remnantFt: number): boolean => {
    const rest = remainingFt[k] ?? 0;
    const minShort = shortFt + Math.max(0, rest - freeFt);
    if (minShort > best.shortFt + FT_EPSILON) return true;
    if (minShort < best.shortFt - FT_EPSILON) return false;
    return remnantFt + Math.min(rest, freeRemnantFt) < best.remnantFt - FT_EPSILON;
  };

  const visit = (k: number, shortFt: number, remnantFt: number): void => {
    nodes += 1;
    if (nodes > maxNodes) {
      isExhaustive = false;
      return;
    }
    if (k === order.length) {
      const figures = figuresOf(pieces, rolls, choice, scrapBelowFt);
      if (compareFigures(figures, best) < 0) {
        best = figures;
        bestChoice = [...choice];
      }
      return;
    }
    if (isHopeless(k, shortFt, remnantFt)) return;
    const i = order[k] as number;
    const piece = pieces[i] as Piece;
    const tried: Roll[] = [];
    for (const j of by) {
      const roll = rolls[j] as Roll;
      if (!isWideEnough(roll, piece) || (left[j] ?? 0) < piece.lengthFt - FT_EPSILON) continue;
      // Untouched rolls that look the same lead to the same subtrees: try the first only.
      if (!touched[j] && tried.some((t) => sameRoll(t, roll))) continue;
      if (!touched[j]) tried.push(roll);
      const wasTouched = touched[j] ?? false;
      choice[i] = j;
      touched[j] = true;
      take(j, roll, piece.lengthFt);
      visit(k + 1, shortFt, remnantFt + (roll.isRemnant ? piece.lengthFt : 0));
      take(j, roll, -piece.lengthFt);
      touched[j] = wasTouched;
      choice[i] = -1;
      if (!isExhaustive) return;
    }
    visit(k + 1, shortFt + piece.lengthFt, remnantFt);
  };

  visit(0, 0, 0);
  return { choice: bestChoice, figures: best, isExhaustive };
}
