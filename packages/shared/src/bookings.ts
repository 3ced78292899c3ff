// Bookings of a crew on a job: an inclusive range of calendar days in the company's zone and
// the phase of the work. The rules live in @seamwright/domain (scheduling); no money here.
import { bookingPhaseLabels, bookingPhases } from '@seamwright/domain';
import type { BookingIssueCode, BookingPhase } from '@seamwright/domain';
import { z } from 'zod';
import { optionalText } from './text.js';

export { bookingPhaseLabels, bookingPhases };
export type { BookingPhase };

const uuid = (label: string) =>
  z.uuid(`${label} must be an id`).transform((value) => value.toLowerCase());
/** zod's ISO date checks the days of each month, leap years included. */
const day = (label: string) => z.iso.date({ error: `${label}: use a real date like 2026-03-14` });
const phase = z.enum(bookingPhases, {
  error: 'Phase is tear_out_base, turf_seams_infill or finishing',
});

export const createBookingInputSchema = z.object({
  crewId: uuid('Crew'),
  jobId: uuid('Job'),
  startDate: day('First day'),
  endDate: day('Last day'),
  phase,
  notes: optionalText(500),
});
export type CreateBookingInput = z.input<typeof createBookingInputSchema>;
export type CreateBookingData = z.output<typeof createBookingInputSchema>;

export const updateBookingInputSchema = z
  .object({
    crewId: uuid('Crew'),
    startDate: day('First day'),
    endDate: day('Last day'),
    phase,
    notes: optionalText(500),
    /** The version the change was made on; a newer one on the server is a 409. */
    version: z.number().int().min(1),
  })
  .partial()
  .refine((value) => Object.keys(value).some((key) => key !== 'version'), {
    message: 'Nothing to change',
  });
export type UpdateBookingInput = z.input<typeof updateBookingInputSchema>;
export type UpdateBookingData = z.output<typeof updateBookingInputSchema>;

export const bookingListQuerySchema = z
  .object({
    from: day('From'),
    to: day('To'),
    crewId: uuid('Crew').optional(),
  })
  .refine((q) => q.to >= q.from, { message: 'To cannot be before from', path: ['to'] })
  .refine((q) => Date.parse(q.to) - Date.parse(q.from) <= 120 * 86_400_000, {
    message: 'Ask for at most 120 days at once',
    path: ['to'],
  });
export type BookingListQuery = z.output<typeof bookingListQuerySchema>;

export interface BookingWarningView {
  code: BookingIssueCode;
  path: string;
  message: string;
}

export interface BookingView {
  id: string;
  crewId: string;
  jobId: string;
  startDate: string;
  endDate: string;
  phase: BookingPhase;
  phaseLabel: string;
  notes: string | null;
  version: number;
  crew: { id: string; name: string; colour: string; colourHex: string };
  job: { id: string; title: string; status: string };
  customerName: string;
  /** `12 Test Lane, Quillmere`. */
  siteAddress: string;
  /** Checked now, so they follow tickets and reservations made since the last change. */
  warnings: BookingWarningView[];
  createdAt: string;
  updatedAt: string;
}

/** The answer to a create or a change. */
export interface BookingSaved {
  id: string;
  version: number;
  warnings: BookingWarningView[];
}
