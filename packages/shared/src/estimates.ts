import { z } from 'zod';
import type { EstimateLine, EstimateLineSource, EstimateTier } from '@seamwright/domain';
import { ESTIMATE_ROUNDING_RULE } from '@seamwright/domain';
import { depositRuleSchema } from './estimating-settings.js';
import type { DepositRule } from './estimating-settings.js';
import { optionalText, requiredText } from './text.js';

// Estimates of a job. Lines, tiers and the rounding rule are computed in @seamwright/domain
// (packages/domain/src/estimates); this file holds what crosses the API.
export { ESTIMATE_ROUNDING_RULE };
export type { EstimateLine, EstimateLineSource, EstimateTier };

export const estimateStatuses = ['draft', 'sent', 'accepted', 'declined', 'superseded'] as const;
export type EstimateStatus = (typeof estimateStatuses)[number];

const isoDate = z.iso.date({ error: 'Use a date like 2026-04-30' });
const id = z.uuid('Not a valid id');
const tierName = requiredText('Tier name', 80);
const quantity = z
  .number({ error: 'Quantity must be a number' })
  .min(0, 'Quantity must not be negative')
  .max(10_000_000, 'Quantity is too large')
  // More decimals than the pricing keeps exactly (QUANTITY_DECIMALS in @seamwright/domain).
  .refine(
    (q) => Math.abs(Math.round(q * 1e6) / 1e6 - q) <= 1e-9 * Math.max(1, q),
    'Use at most 6 decimal places',
  );
const cents = z
  .number({ error: 'Unit price must be a number of cents' })
  .int('Use whole cents')
  .min(0, 'Unit price must not be negative')
  .max(100_000_000, 'Unit price is too large');

/** A tier to price: all turf with `turfProductId`, or each area with its own product. */
const tierSpecSchema = z.object({ name: tierName, turfProductId: id.nullish() }).strict();

/** `POST /api/jobs/:id/estimates`: `{}` prices one tier with each area's own turf. */
export const createEstimateInputSchema = z
  .object({
    tiers: z.array(tierSpecSchema).min(1, 'Give at least one tier').max(5, 'At most 5 tiers'),
    notes: optionalText(4000),
    validUntil: isoDate.nullish(),
  })
  .partial()
  .strict();
export type CreateEstimateInput = z.input<typeof createEstimateInputSchema>;
export type CreateEstimateData = z.output<typeof createEstimateInputSchema>;

const lineChangeSchema = z
  .object({
    id,
    label: requiredText('Label', 200).optional(),
    quantity: quantity.optional(),
    unitPriceCents: cents.optional(),
    taxable: z.boolean().optional(),
  })
  .strict();

const newLineSchema = z
  .object({
    /** The tier to add to; absent: the first. */
    tierId: id.optional(),
    label: requiredText('Label', 200),
    quantity,
    unit: requiredText('Unit', 20),
    unitPriceCents: cents,
    taxable: z.boolean().default(true),
  })
  .strict();

const newTierSchema = z
  .object({
    name: tierName,
    /** Lines copied from this tier (absent: the first). */
    copyFromTierId: id.optional(),
    /** Turf priced again with this product. */
    turfProductId: id.optional(),
  })
  .strict();

/**
 * `PATCH /api/estimates/:id`. Line edits: `update` changes a line (a takeoff line becomes
 * `manual-override`, keeping its rule and the computed figures), `add` types a new `manual`
 * line, `remove` drops lines by id. Tiers: `add`, `rename`, `remove` (never the last one).
 */
export const updateEstimateInputSchema = z
  .object({
    notes: optionalText(4000),
    validUntil: isoDate.nullable(),
    depositRule: depositRuleSchema,
    lines: z
      .object({
        update: z.array(lineChangeSchema).max(200),
        add: z.array(newLineSchema).max(200),
        remove: z.array(id).max(200),
      })
      .partial()
      .strict(),
    tiers: z
      .object({
        add: z.array(newTierSchema).max(5),
        rename: z.array(z.object({ id, name: tierName }).strict()).max(5),
        remove: z.array(id).max(5),
      })
      .partial()
      .strict(),
  })
  .partial()
  .strict()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateEstimateInput = z.input<typeof updateEstimateInputSchema>;
export type UpdateEstimateData = z.output<typeof updateEstimateInputSchema>;

/** An estimate version. `lines` and the totals at the top are the chosen (else first) tier's. */
export interface EstimateView {
  id: string;
  jobId: string;
  version: number;
  status: EstimateStatus;
  lines: EstimateLine[];
  subtotalCents: number;
  taxCents: number;
  /** Subtotal plus tax; the deposit is part of it. */
  totalCents: number;
  depositCents: number;
  tiers: EstimateTier[];
  chosenTierId: string | null;
  /** Takeoff lines that found no price, and similar things the office should look at. */
  warnings: string[];
  notes: string | null;
  validUntil: string | null;
  depositRule: DepositRule;
  markupBasisPoints: number;
  taxRateBasisPoints: number;
  roundingRule: string;
  sentAt: string | null;
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}
