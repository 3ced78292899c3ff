import { z } from 'zod';
import {
  perimeterTagSchema,
  takeoffUsageSchema,
  turfBackingSchema,
} from '../settings/takeoff-settings-schema.js';

const length = z.number().nonnegative();
const count = z.number().int().nonnegative();

/** One cut piece of turf from the layout plan. */
export const turfPieceSchema = z.object({
  widthFt: z.number().positive(),
  lengthFt: z.number().positive(),
});

/**
 * What the takeoff needs to know about one turf area. It is a plain object so the takeoff does
 * not depend on the layout planner; the planner (or a person) fills it in. Per-job depths
 * override the company settings.
 */
export const takeoffInputSchema = z
  .object({
    usage: takeoffUsageSchema,
    areaSqFt: length,
    perimeterFt: length,
    /** Perimeter feet by what the edge meets; the rest of the perimeter counts as unknown. */
    perimeterByTagFt: z.partialRecord(perimeterTagSchema, length).default({}),
    /** Part of the perimeter on tight curves, nailed closer. */
    curvedPerimeterFt: length.default(0),
    seams: z.object({ sideFt: length, buttFt: length, count }),
    turf: z.object({
      orderedSqFt: length,
      pieces: z.array(turfPieceSchema),
      pileHeightIn: z.number().positive().optional(),
      faceWeightOzPerSqYd: z.number().positive().optional(),
      backing: turfBackingSchema.optional(),
    }),
    sprinklers: z
      .object({ halfInchHeads: count, threeQuarterInchHeads: count, zonesClosed: count })
      .default({ halfInchHeads: 0, threeQuarterInchHeads: 0, zonesClosed: 0 }),
    /** Lay rodent wire under the base. */
    rodentWire: z.boolean().default(false),
    /** Rodent wire strip width for this job; the company's roll width when absent. */
    stripWidthFt: z.number().positive().optional(),
    /** Compacted base depth for this job; the company default when absent. */
    baseDepthIn: length.optional(),
    /** Dig depth for this job (0 = no digging); the company default when absent. */
    digDepthIn: length.optional(),
    /** Pets use the area even if it is not a pet run; pets get the secured perimeter. */
    hasPets: z.boolean().default(false),
  })
  .refine((input) => input.curvedPerimeterFt <= input.perimeterFt + 1e-9, {
    message: 'The curved part of the perimeter cannot be longer than the perimeter',
    path: ['curvedPerimeterFt'],
  })
  .refine(
    (input) =>
      Object.values(input.perimeterByTagFt).reduce((sum, ft) => sum + ft, 0) <=
      input.perimeterFt + 1e-6,
    {
      message: 'The tagged edges add up to more than the perimeter',
      path: ['perimeterByTagFt'],
    },
  );

/** Input as the caller may give it (optional parts may be left out). */
export type TakeoffInput = z.input<typeof takeoffInputSchema>;
/** Input after defaults are filled in. */
export type NormalisedTakeoffInput = z.output<typeof takeoffInputSchema>;
