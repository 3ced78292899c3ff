import { z } from 'zod';

/**
 * A company's estimating settings: its overrides of the takeoff defaults (from
 * `@seamwright/takeoff`), markup, tax rate and deposit rule. Rates are **basis points**:
 * 825 = 8.25 %, 10,000 = 100 %.
 */
export const depositRuleSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('percent'),
    basisPoints: z.number().int('Use whole basis points').min(0).max(10_000, 'At most 100 %'),
  }),
  z.object({
    kind: z.literal('amount'),
    cents: z.number().int('Use whole cents').min(0).max(100_000_000),
  }),
]);
export type DepositRule = z.infer<typeof depositRuleSchema>;

const basisPoints = (max: number, label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .int('Use whole basis points')
    .min(0, `${label} must not be negative`)
    .max(max, `${label} must be at most ${max / 100} %`);

export const markupBasisPointsSchema = basisPoints(100_000, 'Markup');
export const taxRateBasisPointsSchema = basisPoints(3_000, 'Tax rate');

/** What a company starts with: no markup, no tax, a 30 % deposit (change all three in Settings). */
export const standardEstimatingSettings = {
  markupBasisPoints: 0,
  taxRateBasisPoints: 0,
  depositRule: { kind: 'percent', basisPoints: 3000 } as DepositRule,
};

/** A JSON value in a takeoff override: `null` clears an override (back to the standard). */
type OverrideValue =
  string | number | boolean | null | OverrideValue[] | { [k: string]: OverrideValue };
const overrideValueSchema: z.ZodType<OverrideValue> = z.lazy(() =>
  z.union([
    z.string(),
    z.number(),
    z.boolean(),
    z.null(),
    z.array(overrideValueSchema),
    z.record(z.string(), overrideValueSchema),
  ]),
);
export type TakeoffOverrides = { [section: string]: OverrideValue };

/**
 * `PATCH /api/estimating-settings`. `takeoff` holds only the settings to change, shaped like
 * `TakeoffSettings` (`{ base: { depthIn: 4 } }`); a `null` leaf resets that setting to the
 * standard. The server validates the merged result with `takeoffSettingsSchema`.
 */
export const updateEstimatingSettingsInputSchema = z
  .object({
    takeoff: z.record(z.string(), overrideValueSchema),
    markupBasisPoints: markupBasisPointsSchema,
    taxRateBasisPoints: taxRateBasisPointsSchema,
    depositRule: depositRuleSchema,
  })
  .partial()
  .strict()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one setting to change');
export type UpdateEstimatingSettingsInput = z.input<typeof updateEstimatingSettingsInputSchema>;
export type UpdateEstimatingSettingsData = z.output<typeof updateEstimatingSettingsInputSchema>;

/** One takeoff setting as the settings screen lists it. */
export interface TakeoffSettingView {
  /** Dotted path into TakeoffSettings, e.g. `base.depthIn`. */
  path: string;
  value: unknown;
  standard: unknown;
  source: string;
  isOverridden: boolean;
}

export interface EstimatingSettingsView {
  /** The effective TakeoffSettings (standard merged with the company's overrides). */
  takeoff: Record<string, unknown>;
  /** Only what the company changed. */
  takeoffOverrides: TakeoffOverrides;
  takeoffFields: TakeoffSettingView[];
  markupBasisPoints: number;
  taxRateBasisPoints: number;
  depositRule: DepositRule;
  standard: typeof standardEstimatingSettings;
}
