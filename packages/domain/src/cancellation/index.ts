// The buyer's right to cancel (TRADE.md §8.2). Only the names other packages need are exported;
// the shared day arithmetic is exported from ../calendar.
export { cancellationPeriod, withinCancellationPeriod } from './cancellation-period.js';
export type {
  CancellationInput,
  CancellationPeriod,
  CoveredSale,
  UncoveredSale,
} from './cancellation-period.js';
export { jurisdictionsOf } from './jurisdiction.js';
export { cancellationNotice, longCalendarDate } from './notice.js';
export type { CancellationNotice, CancellationNoticeInput } from './notice.js';
export { cancellationRules, ftcBusinessHolidays } from './rules.js';
export type { CancellationRule, SalePlace } from './rules.js';
