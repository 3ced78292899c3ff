/** One piece of a job's saved plan: full roll width across the grain, length along it (ft). */
export interface StockPiece {
  readonly widthFt: number;
  readonly lengthFt: number;
}

/** The pieces of one turf product (price-book item) that one job needs. */
export interface ProductPieces {
  readonly productId: string;
  readonly pieces: readonly StockPiece[];
}

/** A roll or remnant in stock, with the length still free (remaining minus other reservations). */
export interface StockRoll {
  readonly id: string;
  readonly productId: string;
  readonly dyeLot: string;
  readonly widthFt: number;
  readonly availableFt: number;
  readonly isRemnant: boolean;
}

/** What the reservation search is asked. */
export interface ReservationRequest {
  readonly products: readonly ProductPieces[];
  readonly rolls: readonly StockRoll[];
  /**
   * A leftover on a cut roll shorter than this (ft) is counted as scrap; longer ones stay in
   * stock as usable turf. Default {@link DEFAULT_SCRAP_BELOW_FT}.
   */
  readonly scrapBelowFt?: number;
  /** Search nodes per dye lot before the best assignment found so far is kept. */
  readonly maxNodesPerLot?: number;
}

/** One piece taken from one roll. */
export interface PieceAllocation {
  readonly rollId: string;
  /** Index of the piece in its product's `pieces`. */
  readonly pieceIndex: number;
  readonly widthFt: number;
  readonly lengthFt: number;
  readonly isRemnant: boolean;
}

/** A piece no roll of the chosen lot can hold: it must be ordered. */
export interface ShortPiece {
  readonly pieceIndex: number;
  readonly widthFt: number;
  readonly lengthFt: number;
}

/** The figures an assignment is ranked by, best first in this order (see README). */
export interface AssignmentFigures {
  /** Length of pieces left unplaced (to order). Least first. */
  readonly shortFt: number;
  /** Length cut from remnants. Most first. */
  readonly remnantFt: number;
  /** Leftovers shorter than `scrapBelowFt` on the rolls cut. Least first. */
  readonly scrapFt: number;
  /** Turf trimmed off the side where a roll is wider than its piece (sq ft). Least first. */
  readonly trimSqFt: number;
  /** Rolls cut into. Fewest first (each one is a heavy roll to move). */
  readonly rollsCut: number;
}

/** The search's answer for one product. */
export interface ProductReservation extends AssignmentFigures {
  readonly productId: string;
  /** The lot every piece comes from; null when the product has no stock at all. */
  readonly dyeLot: string | null;
  readonly allocations: readonly PieceAllocation[];
  readonly shortPieces: readonly ShortPiece[];
  /** What to order, by roll width: the short pieces' lengths added up. */
  readonly toOrder: readonly { readonly widthFt: number; readonly lengthFt: number }[];
  /** Each lot that was compared, with what it would leave short. */
  readonly lotsCompared: readonly { readonly dyeLot: string; readonly shortFt: number }[];
  /** False when the work limit stopped the search before it had proved its answer best. */
  readonly isExhaustive: boolean;
}

export interface ReservationPlan {
  readonly products: readonly ProductReservation[];
  /** Σ shortFt over products. */
  readonly shortFt: number;
}
