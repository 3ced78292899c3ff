// The three phases of a turf install a booking can carry, in the order they happen on site.
// The keys are stable API values; the labels are our own words for the calendar.
export const bookingPhases = ['tear_out_base', 'turf_seams_infill', 'finishing'] as const;
export type BookingPhase = (typeof bookingPhases)[number];

export const bookingPhaseLabels: Record<BookingPhase, string> = {
  tear_out_base: 'Tear-out and base',
  turf_seams_infill: 'Turf, seams and infill',
  finishing: 'Finishing',
};

/** The phase that breaks ground: it needs a locate ticket that allows digging. */
export const diggingPhase: BookingPhase = 'tear_out_base';
/** The phase that lays turf: it needs the job's turf reserved from one dye lot. */
export const turfPhase: BookingPhase = 'turf_seams_infill';

/** The longest booking, in days (a longer one is almost always a typo in a date). */
export const maxBookingDays = 60;

export const weekdayShortNames = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
