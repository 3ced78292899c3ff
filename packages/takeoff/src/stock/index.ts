// Public surface of the roll reservation search (one dye lot per product, cutting stock).
export { reserveTurf } from './reserve-turf.js';
export {
  compareFigures,
  DEFAULT_MAX_NODES_PER_LOT,
  DEFAULT_SCRAP_BELOW_FT,
  MAX_RESERVATION_PIECES,
  MAX_RESERVATION_ROLLS,
} from './figures.js';
export { rollWeightLb, rollHandlingCautions } from './roll-weight.js';
export type {
  AssignmentFigures,
  PieceAllocation,
  ProductPieces,
  ProductReservation,
  ReservationPlan,
  ReservationRequest,
  ShortPiece,
  StockPiece,
  StockRoll,
} from './types.js';
