// Crew bookings: phases, day ranges and the rules every booking is checked against.
export {
  bookingPhaseLabels,
  bookingPhases,
  diggingPhase,
  maxBookingDays,
  turfPhase,
  weekdayShortNames,
} from './phases.js';
export type { BookingPhase } from './phases.js';
export { dayCount, daysOf, rangesOverlap } from './booking-days.js';
export type { DayRange } from './booking-days.js';
export { bookableJobStatuses, checkBookingRange, evaluateBooking } from './booking-rules.js';
export type {
  BookingEvaluation,
  BookingFacts,
  BookingIssue,
  BookingIssueCode,
  BookingTicket,
} from './booking-rules.js';
