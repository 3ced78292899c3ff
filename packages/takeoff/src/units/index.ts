export * from './conversions.js';
export { parseLength } from './parse-length.js';
export type {
  LengthParseError,
  LengthParseErrorCode,
  LengthParseResult,
  MeasurementSystem,
} from './parse-length.js';
export {
  formatArea,
  formatFeetInches,
  formatLength,
  formatLengthRange,
  formatNumber,
} from './format-length.js';
export type { AreaUnit, InchPrecision } from './format-length.js';
