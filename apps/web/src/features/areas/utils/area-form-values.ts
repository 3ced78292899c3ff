import { z } from 'zod';
import {
  areaUsages,
  compassSides,
  facingTargets,
  type AreaGrainChoice,
  type AreaGrainInput,
  type AreaUsage,
  type CompassSide,
  type FacingTarget,
} from '@seamwright/shared';

/** The three ways to choose the grain, as the form's radio buttons. */
export const grainModes = ['cheapest', 'facing', 'angle'] as const;
export type GrainMode = (typeof grainModes)[number];

/** Roll widths offered when no turf product is chosen (TRADE.md §1: 15 ft most common, 12 ft also). */
export const standardRollWidthsFt = [15, 12] as const;

/** A number typed in a box, or null when it does not read as one. */
export function readNumber(text: string): number | null {
  const trimmed = text.trim().replace(/°$/, '').trim();
  if (trimmed === '') return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

function isInRange(text: string, min: number, max: number): boolean {
  const value = readNumber(text);
  return value !== null && value >= min && value <= max;
}

/** Everything but the drawing: boxes hold text, so a half-typed number is kept as typed. */
export const areaFormSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the area a name').max(120, 'At most 120 characters'),
    usage: z.enum(areaUsages, { error: 'Choose what the area is for' }),
    turfProductId: z.string(),
    roll: z.object({ widthFt: z.string().min(1, 'Choose a roll width') }),
    /** Held in feet like every length on screen (LengthField); the API takes inches. */
    baseDepthFt: z
      .number()
      .min(0, 'Must not be negative')
      .max(1, 'At most 12 in (30 cm)')
      .nullable(),
    grain: z.object({
      kind: z.enum(grainModes),
      angleDeg: z.string(),
      facing: z.enum(compassSides),
      toward: z.enum(['', ...facingTargets]),
      toleranceDeg: z.string(),
    }),
  })
  .superRefine((values, ctx) => {
    const { grain } = values;
    if (grain.kind === 'angle' && !isInRange(grain.angleDeg, 0, 360))
      ctx.addIssue({
        code: 'custom',
        path: ['grain', 'angleDeg'],
        message: 'Give a direction from 0 to 360°',
      });
    if (
      grain.kind === 'facing' &&
      grain.toleranceDeg.trim() !== '' &&
      !isInRange(grain.toleranceDeg, 0, 180)
    )
      ctx.addIssue({
        code: 'custom',
        path: ['grain', 'toleranceDeg'],
        message: 'Give 0 to 180°, or leave it empty',
      });
  });
export type AreaFormValues = z.input<typeof areaFormSchema>;

/** The settings part of the areas API body, read from the form. */
export interface AreaSettings {
  name: string;
  usage: AreaUsage;
  turfProductId: string | null;
  roll: { widthFt: number };
  baseDepthIn: number | null;
  grain: AreaGrainInput;
}

/** The grain as the API takes it: `"cheapest"`, `{ angleDeg }` or `{ facing, toward?, toleranceDeg? }`. */
export function grainInputOf(grain: AreaFormValues['grain']): AreaGrainInput {
  if (grain.kind === 'angle') return { angleDeg: readNumber(grain.angleDeg) ?? 0 };
  if (grain.kind === 'cheapest') return 'cheapest';
  const tolerance = readNumber(grain.toleranceDeg);
  return {
    facing: grain.facing,
    ...(grain.toward ? { toward: grain.toward } : {}),
    ...(tolerance !== null && tolerance > 0 ? { toleranceDeg: tolerance } : {}),
  };
}

export function areaSettingsOf(values: AreaFormValues): AreaSettings {
  return {
    name: values.name.trim(),
    usage: values.usage,
    turfProductId: values.turfProductId || null,
    roll: { widthFt: readNumber(values.roll.widthFt) ?? 0 },
    baseDepthIn:
      values.baseDepthFt === null ? null : Math.round(values.baseDepthFt * 12 * 1000) / 1000,
    grain: grainInputOf(values.grain),
  };
}

/** What the form starts with: a saved area's settings, or a new landscape area. */
export function areaFormDefaults(
  saved: {
    name: string;
    usage: AreaUsage;
    turfProductId: string | null;
    rollWidthFt: number;
    baseDepthIn: number | null;
    grainChoice: AreaGrainChoice;
  } | null,
  firstProduct: { id: string; rollWidthsFt: readonly number[] } | null,
): AreaFormValues {
  const grain = {
    kind: 'cheapest' as GrainMode,
    angleDeg: '',
    facing: 'S' as CompassSide,
    toward: '' as '' | FacingTarget,
    toleranceDeg: '',
  };
  if (!saved) {
    return {
      name: '',
      usage: 'landscape',
      turfProductId: firstProduct?.id ?? '',
      roll: { widthFt: String(firstProduct?.rollWidthsFt[0] ?? standardRollWidthsFt[0]) },
      baseDepthFt: null,
      grain,
    };
  }
  const choice = saved.grainChoice;
  if (choice.kind === 'angle')
    Object.assign(grain, { kind: 'angle', angleDeg: String(choice.angleDeg) });
  if (choice.kind === 'facing')
    Object.assign(grain, {
      kind: 'facing',
      facing: choice.facing,
      toward: choice.toward ?? '',
      toleranceDeg: choice.toleranceDeg > 0 ? String(choice.toleranceDeg) : '',
    });
  return {
    name: saved.name,
    usage: saved.usage,
    turfProductId: saved.turfProductId ?? '',
    roll: { widthFt: String(saved.rollWidthFt) },
    baseDepthFt: saved.baseDepthIn === null ? null : saved.baseDepthIn / 12,
    grain,
  };
}
