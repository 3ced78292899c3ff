import { z } from 'zod';
import { pageQuerySchema } from './list.js';
import { requiredText } from './text.js';

/**
 * The company's price book. Prices are integer **millicents**: 1 cent = 1,000 millicents, so
 * 1 currency unit = 100,000 millicents. Per-unit rates such as turf per sq ft or labour per
 * seam ft often need fractions of a cent ($0.125 per sq ft = 12,500 millicents); totals built
 * from them are rounded to whole cents once, at the end. The CSV shows the same figure as a
 * decimal in currency units (`0.125`), exact to 5 decimal places.
 */
export const MILLICENTS_PER_CENT = 1000;
export const MILLICENTS_PER_UNIT = 100_000;

export const priceBookKinds = ['turf', 'material', 'labour', 'equipment', 'disposal'] as const;
export type PriceBookKind = (typeof priceBookKinds)[number];

export const priceBookKindLabels: Record<PriceBookKind, string> = {
  turf: 'Turf',
  material: 'Material',
  labour: 'Labour',
  equipment: 'Equipment rental',
  disposal: 'Disposal',
};

export const labourBases = ['per_sq_ft', 'per_seam_ft', 'per_hour'] as const;
export type LabourBasis = (typeof labourBases)[number];

const positive = z.number().positive('Must be more than 0');

export const turfAttributesSchema = z.object({
  pileHeightIn: positive.max(6, 'At most 6 in'),
  rollWidthsFt: z
    .array(positive.max(30, 'At most 30 ft'))
    .min(1, 'Give at least one roll width')
    .max(5),
  maxRollLengthFt: positive.max(500, 'At most 500 ft'),
  recommendedInfill: z.string().trim().max(120).nullable(),
  infillRateLbPerSqFt: z.number().nonnegative().max(10, 'At most 10 lb per sq ft').nullable(),
});
export type TurfAttributes = z.infer<typeof turfAttributesSchema>;

export const labourAttributesSchema = z.object({ basis: z.enum(labourBases) });
export type LabourAttributes = z.infer<typeof labourAttributesSchema>;

const noAttributes = z.object({}).strict();

const itemBase = {
  key: z
    .string()
    .trim()
    .min(1, 'Key is required')
    .max(60)
    .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'Use letters, digits, dots, dashes and underscores'),
  name: requiredText('Name', 120),
  unit: requiredText('Unit', 20),
  /** How many units one pack holds (e.g. 50 lb per bag); null when sold loose. */
  packSize: positive.max(100_000).nullable(),
  priceMillicents: z
    .number()
    .int('Use a whole number of millicents')
    .nonnegative('Must not be negative')
    .max(100_000 * 100_000, 'Too large'),
  isStarter: z.boolean().default(false),
};

/** A whole price-book item; `attributes` depend on `kind`. */
export const priceBookItemInputSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('turf'), ...itemBase, attributes: turfAttributesSchema }),
  z.object({ kind: z.literal('labour'), ...itemBase, attributes: labourAttributesSchema }),
  z.object({ kind: z.literal('material'), ...itemBase, attributes: noAttributes.default({}) }),
  z.object({ kind: z.literal('equipment'), ...itemBase, attributes: noAttributes.default({}) }),
  z.object({ kind: z.literal('disposal'), ...itemBase, attributes: noAttributes.default({}) }),
]);
export type PriceBookItemInput = z.input<typeof priceBookItemInputSchema>;
export type PriceBookItemData = z.output<typeof priceBookItemInputSchema>;

/**
 * A change to an item. The service merges it with the stored item and validates the whole
 * result with {@link priceBookItemInputSchema}, so kind and attributes always agree.
 */
export const updatePriceBookItemInputSchema = z
  .object({
    kind: z.enum(priceBookKinds),
    key: z.string(),
    name: z.string(),
    unit: z.string(),
    packSize: z.number().nullable(),
    priceMillicents: z.number(),
    isStarter: z.boolean(),
    attributes: z.record(z.string(), z.unknown()),
  })
  .partial()
  .strict()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdatePriceBookItemInput = z.input<typeof updatePriceBookItemInputSchema>;

export const priceBookListQuerySchema = pageQuerySchema.extend({
  kind: z.enum(priceBookKinds).optional(),
  q: z.string().trim().max(100).optional(),
});
export type PriceBookListQuery = z.output<typeof priceBookListQuerySchema>;

export type PriceBookItemView = PriceBookItemData & {
  id: string;
  createdAt: string;
  updatedAt: string;
};

/** `POST /api/price-book/import`: the CSV text; `dryRun` answers the preview and writes nothing. */
export const priceBookImportInputSchema = z.object({
  csv: z.string().min(1, 'The file is empty').max(900_000, 'The file is too large'),
  dryRun: z.boolean(),
});
export type PriceBookImportInput = z.infer<typeof priceBookImportInputSchema>;

export interface PriceBookImportRowError {
  /** The CSV column at fault (`price`, `rollWidthsFt`, …), or `row` for the row as a whole. */
  field: string;
  message: string;
}

export interface PriceBookImportRow {
  /** Line number in the file (the header is line 1). */
  line: number;
  action: 'create' | 'update';
  /** The item as it would be saved; null when the row could not be read. */
  item: PriceBookItemData | null;
  /** The row's values as read from the file, for the preview when `item` is null. */
  raw: Record<string, string>;
  errors: PriceBookImportRowError[];
}

export interface PriceBookImportPreview {
  rows: PriceBookImportRow[];
  summary: { total: number; create: number; update: number; withErrors: number };
  /** True when the import was written (never on a dry run). */
  imported: boolean;
}
