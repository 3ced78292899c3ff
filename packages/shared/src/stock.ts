// Roll stock: rolls and remnants of turf by dye lot, and a job's reservation of its pieces on
// rolls of one lot per product. Lengths are feet; no money anywhere (crew leads read stock).
import { z } from 'zod';
import { pageQuerySchema } from './list.js';
import { optionalText, requiredText } from './text.js';

const uuid = (label: string) =>
  z.uuid(`${label} must be an id`).transform((value) => value.toLowerCase());
const widthFt = z
  .number({ error: 'Width is required (ft)' })
  .positive('Width must be more than 0 ft')
  .max(30, 'Width is at most 30 ft');
const lengthFt = z
  .number({ error: 'Length is required (ft)' })
  .positive('Length must be more than 0 ft')
  .max(1000, 'Length is at most 1,000 ft');
/** Dye lots are printed on the roll's label; kept as typed, trimmed. */
export const dyeLotSchema = requiredText('Dye lot', 60);
const isoDate = z.iso.date('Use a date like 2026-03-14');

export const createRollInputSchema = z.object({
  turfProductId: uuid('Turf product'),
  dyeLot: dyeLotSchema,
  widthFt,
  lengthFt,
  location: optionalText(120),
  isRemnant: z.boolean().default(false),
  receivedOn: isoDate.nullish().transform((value) => value ?? null),
  notes: optionalText(500),
});
export type CreateRollInput = z.input<typeof createRollInputSchema>;
export type CreateRollData = z.output<typeof createRollInputSchema>;

/** A delivery: several rolls of one product and dye lot, received together. */
export const receiveDeliveryInputSchema = z.object({
  turfProductId: uuid('Turf product'),
  dyeLot: dyeLotSchema,
  location: optionalText(120),
  receivedOn: isoDate.nullish().transform((value) => value ?? null),
  rolls: z
    .array(z.object({ widthFt, lengthFt }))
    .min(1, 'List at least one roll')
    .max(50, 'At most 50 rolls in one delivery'),
});
export type ReceiveDeliveryInput = z.input<typeof receiveDeliveryInputSchema>;
export type ReceiveDeliveryData = z.output<typeof receiveDeliveryInputSchema>;

export const updateRollInputSchema = z
  .object({
    dyeLot: dyeLotSchema,
    location: optionalText(120),
    /** A count correction; never below what jobs hold on the roll. */
    remainingFt: z.number().min(0, 'Length left cannot be negative').max(1000),
    notes: optionalText(500),
    archived: z.boolean(),
  })
  .partial()
  .refine((value) => Object.keys(value).length > 0, { message: 'Nothing to change' });
export type UpdateRollInput = z.input<typeof updateRollInputSchema>;
export type UpdateRollData = z.output<typeof updateRollInputSchema>;

export const rollKinds = ['all', 'roll', 'remnant'] as const;
export const rollListQuerySchema = pageQuerySchema.extend({
  turfProductId: uuid('Turf product').optional(),
  dyeLot: z.string().trim().max(60).optional(),
  kind: z.enum(rollKinds).default('all'),
  /** Used-up and archived rolls are hidden unless asked for. */
  includeEmpty: z
    .enum(['true', 'false'])
    .default('false')
    .transform((value) => value === 'true'),
});
export type RollListQuery = z.output<typeof rollListQuerySchema>;

export const createReservationInputSchema = z.object({
  /**
   * Hold what stock there is even when some pieces must be ordered. Without it a job that no
   * single dye lot can hold is refused (409) and nothing is held.
   */
  allowShort: z.boolean().default(false),
});
export type CreateReservationInput = z.input<typeof createReservationInputSchema>;

/** What the crew brings back from a job: pieces of the rolls it cut, as remnants. */
export const returnRemnantsInputSchema = z.object({
  remnants: z
    .array(
      z.object({
        rollId: uuid('Roll'),
        widthFt: widthFt.optional(),
        lengthFt,
        location: optionalText(120),
      }),
    )
    .min(1, 'List at least one remnant')
    .max(50),
});
export type ReturnRemnantsInput = z.input<typeof returnRemnantsInputSchema>;

export interface RollView {
  id: string;
  turfProductId: string;
  turfProductName: string;
  dyeLot: string;
  widthFt: number;
  /** As received (or as cut, for a remnant). */
  lengthFt: number;
  /** What is physically left on the roll. */
  remainingFt: number;
  /** Held by jobs' reservations, not cut yet. */
  heldFt: number;
  /** remainingFt − heldFt: what a new reservation may take. */
  availableFt: number;
  location: string | null;
  isRemnant: boolean;
  sourceJobId: string | null;
  receivedOn: string | null;
  notes: string | null;
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface ReservationAllocationView {
  rollId: string;
  dyeLot: string;
  isRemnant: boolean;
  areaId: string;
  areaName: string;
  /** Index into the area's `plan.pieces` (the cut sheet numbers them from 1). */
  piece: number;
  widthFt: number;
  lengthFt: number;
}

export interface ReservationProductView {
  turfProductId: string;
  turfProductName: string;
  /** Null when the product has no stock at all. */
  dyeLot: string | null;
  allocations: ReservationAllocationView[];
  shortFt: number;
  /** Length to order per roll width. */
  toOrder: { widthFt: number; lengthFt: number }[];
  /** False when the search stopped at its work limit (the answer is still valid). */
  isExhaustive: boolean;
}

export const reservationStatuses = ['held', 'cut'] as const;
export type ReservationStatus = (typeof reservationStatuses)[number];

export interface JobReservationView {
  jobId: string;
  /** Null when nothing is reserved for the job. */
  status: ReservationStatus | null;
  /** The first product's lot (most jobs have one turf product). */
  dyeLot: string | null;
  allocations: ReservationAllocationView[];
  shortFt: number;
  products: ReservationProductView[];
  reservedAt: string | null;
}
