import { z } from 'zod';
import { requiredText } from './text.js';
import type { AreaUnderlayView } from './underlay.js';

/**
 * Areas of a job and their saved plans (`POST /api/jobs/:id/areas`, `GET|PATCH|DELETE
 * /api/areas/:id`). The geometry fields (`area`, `roll`, `edges`, `holeEdges`, `trafficPaths`,
 * `lengthStepFt`, `trimAllowanceFt`) are the layout planner's request (DOMAIN.md, "The layout
 * planner contract") and are validated by the planner itself, which names the field at fault;
 * this schema checks the rest.
 */
export const areaUsages = ['landscape', 'pet', 'play', 'putting'] as const;
export type AreaUsage = (typeof areaUsages)[number];

export const areaUsageLabels: Record<AreaUsage, string> = {
  landscape: 'Landscape',
  pet: 'Pet run',
  play: 'Play area',
  putting: 'Putting green',
};

/** The eight compass sides a grain may face (as the job planner's `grain.facing`). */
export const compassSides = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'] as const;
export type CompassSide = (typeof compassSides)[number];

/** What a facing grain faces, for the words on screen ("facing the street, to the south"). */
export const facingTargets = ['street', 'house'] as const;
export type FacingTarget = (typeof facingTargets)[number];

const finite = z.number({ error: 'Must be a number' }).refine(Number.isFinite, 'Must be finite');

/**
 * How the grain is chosen, as sent:
 * - `{ angleDeg }`: a chosen direction (degrees counter-clockwise from east);
 * - `{ facing, toleranceDeg?, toward? }`: the blades lean toward a compass side (the street or
 *   the house), turned at most `toleranceDeg` either way to save turf (job planner rules);
 * - `"cheapest"`, or no `grain`: the direction that orders the least turf.
 */
export const areaGrainInputSchema = z.union(
  [
    z.literal('cheapest'),
    z.object({ angleDeg: finite }).strict(),
    z
      .object({
        facing: z.enum(compassSides, { error: 'Choose a compass side (N, NE, E, …)' }),
        toleranceDeg: z.number().min(0, 'At least 0°').max(180, 'At most 180°').optional(),
        toward: z.enum(facingTargets).nullish(),
      })
      .strict(),
  ],
  { error: 'Give "cheapest", { angleDeg } or { facing }' },
);
export type AreaGrainInput = z.input<typeof areaGrainInputSchema>;

/** The grain choice as stored and shown. */
export type AreaGrainChoice =
  | { kind: 'cheapest' }
  | { kind: 'angle'; angleDeg: number }
  | { kind: 'facing'; facing: CompassSide; toleranceDeg: number; toward: FacingTarget | null };

/** `"cheapest"`, `{ angleDeg }` or `{ facing }` as the stored choice (absent → cheapest). */
export function toGrainChoice(input: AreaGrainInput | null | undefined): AreaGrainChoice {
  if (input === undefined || input === null || input === 'cheapest') return { kind: 'cheapest' };
  if ('angleDeg' in input) return { kind: 'angle', angleDeg: input.angleDeg };
  return {
    kind: 'facing',
    facing: input.facing,
    toleranceDeg: input.toleranceDeg ?? 0,
    toward: input.toward ?? null,
  };
}

const uuid = z.uuid({ error: 'Choose a turf product' }).transform((value) => value.toLowerCase());

/** Planner fields, passed through to the planner unchanged (it validates them). */
const plannerFields = {
  area: z.unknown(),
  roll: z.unknown(),
  edges: z.unknown().optional(),
  holeEdges: z.unknown().optional(),
  trafficPaths: z.unknown().optional(),
  lengthStepFt: z.unknown().optional(),
  trimAllowanceFt: z.unknown().optional(),
};

const settingsFields = {
  name: requiredText('Name', 120),
  usage: z.enum(areaUsages, { error: 'Choose landscape, pet, play or putting' }),
  grain: areaGrainInputSchema.nullish(),
  turfProductId: uuid.nullish(),
  baseDepthIn: z
    .number({ error: 'Must be a number' })
    .min(0, 'Must not be negative')
    .max(12, 'At most 12 in')
    .nullish(),
};

export const createAreaInputSchema = z.object({ ...settingsFields, ...plannerFields });
export type CreateAreaInput = z.input<typeof createAreaInputSchema>;
export type CreateAreaData = z.output<typeof createAreaInputSchema>;

export const updateAreaInputSchema = z
  .object({ ...settingsFields, ...plannerFields })
  .partial()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateAreaInput = z.input<typeof updateAreaInputSchema>;
export type UpdateAreaData = z.output<typeof updateAreaInputSchema>;

/** The turf product an area uses, as it was when the plan was saved. */
export interface AreaTurfProduct {
  id: string;
  key: string;
  name: string;
  pileHeightIn: number;
  rollWidthsFt: number[];
  maxRollLengthFt: number;
}

/** One alternative plan, computed on the server beside the chosen one. */
export interface AreaAlternativeView<TPlan = Record<string, unknown>> {
  kind: 'chosen' | 'cheapest' | 'turned' | 'other-width';
  label: string;
  rollWidthFt: number;
  grainAngleDeg: number;
  orderedSqFt: number;
  wastePct: number;
  seamCount: number;
  /** Side plus butt seams. */
  seamFt: number;
  /** Seam length that still runs through walkways. */
  walkwaySeamFt: number;
  /** Same layout as the chosen plan (e.g. the chosen direction is already the cheapest). */
  sameAsChosen: boolean;
  plan: TPlan;
}

/**
 * An area with its saved plan. `request` is exactly what was planned (planning it again with
 * the engine `plan.engineVersion` gives `plan`); `TPlan` is the planner's LayoutPlan for
 * clients that import @seamwright/takeoff.
 */
export interface AreaView<TPlan = Record<string, unknown>> {
  id: string;
  jobId: string;
  name: string;
  usage: AreaUsage;
  grainChoice: AreaGrainChoice;
  turfProductId: string | null;
  turfProduct: AreaTurfProduct | null;
  baseDepthIn: number | null;
  areaSqFt: number;
  orderedSqFt: number;
  wastePct: number;
  request: Record<string, unknown>;
  plan: TPlan & { engineVersion: string };
  alternatives: AreaAlternativeView<TPlan>[];
  /** The photo or sketch under the drawing, or null (`/api/areas/:id/underlay`). */
  underlay: AreaUnderlayView | null;
  createdAt: string;
  updatedAt: string;
}

/** A safety caution (packages/takeoff/src/cautions), as the API sends it. */
export interface CautionView {
  key: string;
  title: string;
  body: string;
  deferral: string;
  reference: string;
}

/** One area's share of a job takeoff line. */
export interface TakeoffLineAreaShare {
  areaId: string;
  areaName: string;
  turfProductId: string | null;
  quantity: number;
  rawQuantity: number;
  rule: string;
}

/** A takeoff line over all of a job's areas (each area's line, added up). */
export interface JobTakeoffLineView {
  key: string;
  kind: string;
  label: string;
  quantity: number;
  unit: string;
  rawQuantity: number;
  rule: string;
  rounding: string;
  inputs: Record<string, number | string>;
  warnings: string[];
  areas: TakeoffLineAreaShare[];
}

/** `GET /api/jobs/:id/takeoff`. */
export interface JobTakeoffView {
  jobId: string;
  lines: JobTakeoffLineView[];
  areas: { id: string; name: string; usage: AreaUsage; cautions: CautionView[] }[];
  cautions: CautionView[];
}
