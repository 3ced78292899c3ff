import { z } from 'zod';

/**
 * The company's estimating defaults for the material takeoff. Every number the takeoff rules
 * use lives here, so a company can match its own practice and its suppliers' figures; nothing
 * trade-specific is hard-wired in the rules themselves.
 */

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const percent = z.number().min(0).max(100);
const wholeCount = z.number().int().nonnegative();

/** What the turf area is used for; it picks the infill recipe and some cautions. */
export const takeoffUsageSchema = z.enum(['landscape', 'pet', 'play', 'putting']);
/** A usage of the turf area (see {@link takeoffUsageSchema}). */
export type TakeoffUsage = z.infer<typeof takeoffUsageSchema>;

/** What an edge of the area meets; the planner tags perimeter runs with these. */
export const perimeterTagSchema = z.enum(['hard', 'bed', 'lawn', 'fence', 'house', 'unknown']);
/** An edge tag (see {@link perimeterTagSchema}). */
export type PerimeterTag = z.infer<typeof perimeterTagSchema>;

/** Infill materials; silica-based kinds raise the silica-dust caution. */
export const infillKindSchema = z.enum([
  'silica-sand',
  'coated-sand',
  'zeolite',
  'crumb-rubber',
  'organic',
]);
/** An infill material kind (see {@link infillKindSchema}). */
export type InfillKind = z.infer<typeof infillKindSchema>;

/** Turf backing types with a known backing weight. */
export const turfBackingSchema = z.enum(['latex', 'polyurethane']);
/** A turf backing type (see {@link turfBackingSchema}). */
export type TurfBacking = z.infer<typeof turfBackingSchema>;

/** One infill layer: spread at `rateLbPerSqFt` over the whole area, bought in `bagLb` bags. */
export const infillLayerSchema = z.object({
  key: z.string().regex(/^[a-z0-9-]+$/, 'Use lower-case letters, digits and dashes'),
  label: z.string().min(1).max(80),
  kind: infillKindSchema,
  rateLbPerSqFt: positive,
  bagLb: positive,
});
/** One infill layer (see {@link infillLayerSchema}). */
export type InfillLayer = z.infer<typeof infillLayerSchema>;

/** The infill recipe for one usage and the typical total range that triggers a warning. */
export const infillRecipeSchema = z
  .object({
    layers: z.array(infillLayerSchema).max(5),
    typicalMinLbPerSqFt: nonNegative,
    typicalMaxLbPerSqFt: nonNegative,
  })
  .refine((r) => r.typicalMinLbPerSqFt <= r.typicalMaxLbPerSqFt, {
    message: 'The lowest typical rate must not exceed the highest',
  });
/** An infill recipe (see {@link infillRecipeSchema}). */
export type InfillRecipe = z.infer<typeof infillRecipeSchema>;

/**
 * Equipment rented by the day, sized from how much area it covers per day. `neededFor` says
 * which part of the work needs it, so a job with no digging rents no sod cutter.
 */
export const equipmentRateSchema = z.object({
  key: z.string().regex(/^[a-z0-9-]+$/),
  label: z.string().min(1).max(80),
  sqFtPerDay: positive,
  neededFor: z.enum(['excavation', 'base', 'infill', 'always']),
});
/** A piece of rented equipment and its daily production (see {@link equipmentRateSchema}). */
export type EquipmentRate = z.infer<typeof equipmentRateSchema>;

/** The full settings object; validate stored or submitted settings with this. */
export const takeoffSettingsSchema = z.object({
  excavation: z.object({
    digDepthIn: nonNegative,
    soilSwellPercent: percent,
    spoilLooseDensityLbPerCuYd: positive,
  }),
  base: z.object({
    depthIn: nonNegative,
    looseToCompactedFactor: z.number().min(1).max(2),
    densityTonsPerCuYd: positive,
    orderIncrementCuYd: positive,
    orderIncrementTons: positive,
  }),
  compaction: z.object({
    targetPercent: z.number().min(50).max(110),
    testName: z.string().min(1).max(120),
  }),
  perimeterNails: z.object({ straightSpacingIn: positive, curveSpacingIn: positive }),
  seamNails: z.object({ isNailed: z.boolean(), offsetIn: nonNegative, spacingIn: positive }),
  seamTape: z.object({ rollLengthFt: positive, widthIn: positive }),
  adhesive: z.object({ coverageLfPerGal: positive, containerGal: positive }),
  staples: z.object({ isUsedOnEdging: z.boolean(), spacingIn: positive }),
  edging: z.object({
    tags: z.array(perimeterTagSchema),
    stockLengthFt: positive,
    wastePercent: percent,
    stakeSpacingIn: positive,
  }),
  petPerimeter: z.object({
    boardLabel: z.string().min(1).max(80),
    skippedTags: z.array(perimeterTagSchema),
    stockLengthFt: positive,
    wastePercent: percent,
    screwSpacingIn: positive,
  }),
  infill: z.object({
    landscape: infillRecipeSchema,
    pet: infillRecipeSchema,
    play: infillRecipeSchema,
    putting: infillRecipeSchema,
  }),
  rodentWire: z.object({ rollWidthFt: positive, rollLengthFt: positive, overlapIn: nonNegative }),
  sprinklerCaps: z.object({
    capsPerHead: wholeCount,
    capsPerClosedZone: wholeCount,
    closedZoneCapSizeIn: positive,
  }),
  haul: z.object({
    label: z.string().min(1).max(80),
    capacityCuYd: positive,
    capacityTons: positive,
  }),
  labour: z.object({
    installSqFtPerCrewHour: positive,
    seamFtPerHour: positive,
    hourIncrement: positive,
  }),
  equipment: z.array(equipmentRateSchema).max(10),
  finishHeight: z.object({ aboveHardSurfaceIn: nonNegative }),
  turfWeight: z.object({
    latexBackingOzPerSqYd: nonNegative,
    polyurethaneBackingOzPerSqYd: nonNegative,
    assumedBacking: turfBackingSchema,
    liftLimitLb: positive,
  }),
});

/** The company's estimating defaults (see {@link takeoffSettingsSchema}). */
export type TakeoffSettings = z.infer<typeof takeoffSettingsSchema>;
