import {
  compareFigures,
  DEFAULT_MAX_NODES_PER_LOT,
  DEFAULT_SCRAP_BELOW_FT,
  FT_EPSILON,
} from './figures.js';
import { searchLot } from './lot-search.js';
import type { LotSearchResult } from './lot-search.js';
import type {
  AssignmentFigures,
  ProductPieces,
  ProductReservation,
  ReservationPlan,
  ReservationRequest,
  ShortPiece,
  StockRoll,
} from './types.js';

const noFigures = (shortFt: number): AssignmentFigures => ({
  shortFt,
  remnantFt: 0,
  scrapFt: 0,
  trimSqFt: 0,
  rollsCut: 0,
});

/** Short pieces added up per roll width, narrowest first. */
function orderList(short: readonly ShortPiece[]) {
  const byWidth = new Map<number, number>();
  for (const piece of short)
    byWidth.set(piece.widthFt, (byWidth.get(piece.widthFt) ?? 0) + piece.lengthFt);
  return [...byWidth.entries()]
    .sort(([a], [b]) => a - b)
    .map(([widthFt, lengthFt]) => ({ widthFt, lengthFt }));
}

/** The product's rolls with free length, by dye lot (lots in name order). */
function lotsOf(productId: string, rolls: readonly StockRoll[]): [string, StockRoll[]][] {
  const lots = new Map<string, StockRoll[]>();
  for (const roll of rolls) {
    if (roll.productId !== productId || roll.availableFt <= FT_EPSILON) continue;
    const list = lots.get(roll.dyeLot) ?? [];
    list.push(roll);
    lots.set(roll.dyeLot, list);
  }
  return [...lots.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
}

function reserveProduct(
  product: ProductPieces,
  rolls: readonly StockRoll[],
  scrapBelowFt: number,
  maxNodes: number,
): ProductReservation {
  const totalFt = product.pieces.reduce((sum, p) => sum + p.lengthFt, 0);
  let best: { dyeLot: string; rolls: StockRoll[]; result: LotSearchResult } | null = null;
  const lotsCompared: { dyeLot: string; shortFt: number }[] = [];
  for (const [dyeLot, lotRolls] of lotsOf(product.productId, rolls)) {
    const result = searchLot(product.pieces, lotRolls, scrapBelowFt, maxNodes);
    lotsCompared.push({ dyeLot, shortFt: result.figures.shortFt });
    // Lots are visited in name order, so a tie keeps the first name: deterministic.
    if (!best || compareFigures(result.figures, best.result.figures) < 0)
      best = { dyeLot, rolls: lotRolls, result };
  }
  if (!best) {
    const shortPieces = product.pieces.map((p, pieceIndex) => ({ pieceIndex, ...p }));
    return {
      productId: product.productId,
      dyeLot: null,
      ...noFigures(totalFt),
      allocations: [],
      shortPieces,
      toOrder: orderList(shortPieces),
      lotsCompared,
      isExhaustive: true,
    };
  }
  const { dyeLot, rolls: lotRolls, result } = best;
  const allocations = [];
  const shortPieces: ShortPiece[] = [];
  for (const [pieceIndex, piece] of product.pieces.entries()) {
    const roll = lotRolls[result.choice[pieceIndex] ?? -1];
    if (!roll) {
      shortPieces.push({ pieceIndex, widthFt: piece.widthFt, lengthFt: piece.lengthFt });
      continue;
    }
    allocations.push({
      rollId: roll.id,
      pieceIndex,
      widthFt: piece.widthFt,
      lengthFt: piece.lengthFt,
      isRemnant: roll.isRemnant,
    });
  }
  return {
    productId: product.productId,
    dyeLot,
    ...result.figures,
    allocations,
    shortPieces,
    toOrder: orderList(shortPieces),
    lotsCompared,
    isExhaustive: result.isExhaustive,
  };
}

/**
 * Reserves a job's turf: per product ONE dye lot (every connecting piece of a job must come
 * from the same production run), and each piece on one roll of that lot, choosing the lot and
 * assignment that leave least short, use remnants first where they fit, leave least scrap,
 * trim least off the side and cut the fewest rolls. Pure and deterministic; see README
 * ("Reservation search").
 */
export function reserveTurf(request: ReservationRequest): ReservationPlan {
  const scrapBelowFt = request.scrapBelowFt ?? DEFAULT_SCRAP_BELOW_FT;
  const maxNodes = request.maxNodesPerLot ?? DEFAULT_MAX_NODES_PER_LOT;
  const products = request.products.map((product) =>
    reserveProduct(product, request.rolls, scrapBelowFt, maxNodes),
  );
  return { products, shortFt: products.reduce((sum, p) => sum + p.shortFt, 0) };
}
