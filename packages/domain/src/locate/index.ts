// One-call (811) locate tickets (TRADE.md §6): dated region rules, the earliest lawful dig, the
// expiry and the check a booking's start must pass.
export { checkDigDate } from './check-dig-date.js';
export type { DigDateCheck } from './check-dig-date.js';
export { calendarOfRule, computeLocateTicket } from './locate-ticket.js';
export type {
  LocateTicketComputation,
  LocateTicketInput,
  LocateTicketTimes,
} from './locate-ticket.js';
export { defaultLocateRule, floridaOneCallHolidays, locateRules } from './rules.js';
export type { LocateDays, LocateHolidays, LocateNotice, LocateRule } from './rules.js';
export { normalizeLocateRegion, selectLocateRule } from './select-rule.js';
export type { SelectedLocateRule } from './select-rule.js';
export { allowedLocateStatusMoves, effectiveLocateStatus, locateTicketStatuses } from './status.js';
export type { LocateTicketStatus } from './status.js';
