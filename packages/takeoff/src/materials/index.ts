export { computeTakeoff, takeoffWarnings } from './compute-takeoff.js';
export { applyOverrides, unmatchedOverrides } from './overrides.js';
export { formatQuantity, formatQuantityIn } from './format-quantity.js';
export type { TakeoffOverride } from './overrides.js';
export { takeoffInputSchema, turfPieceSchema } from './takeoff-input.js';
export type { NormalisedTakeoffInput, TakeoffInput } from './takeoff-input.js';
export type {
  TakeoffLine,
  TakeoffLineKind,
  TakeoffLineOverride,
  TakeoffUnit,
} from './takeoff-line.js';
export { infillRangeWarnings } from './lines/infill-lines.js';
export * from './formulas.js';
