import { z } from 'zod';
import type { MeasurementSystem } from '@seamwright/takeoff';
import { edgeChoices, type EdgeChoice } from './edge-tags';

export const shapeKinds = ['rectangle', 'l-shape', 'points'] as const;
export type ShapeKind = (typeof shapeKinds)[number];

/** "Choose for me" leaves the grain to the planner; the others fix it. */
export const grainChoices = ['auto', 'north-south', 'east-west', 'angle'] as const;
export type GrainChoice = (typeof grainChoices)[number];

export const rollWidthsFt = [12, 15] as const;
export type RollWidthFt = (typeof rollWidthsFt)[number];

export const usages = ['landscape', 'pet', 'play', 'putting'] as const;
export type Usage = (typeof usages)[number];

/** The sample L from the planner's benchmark, as points, so the points box never opens empty. */
const samplePoints = ['0, 0', '40, 0', '40, 15', '20, 15', '20, 30', '0, 30'].join('\n');

export const layoutParamDefaults = {
  shape: 'rectangle',
  len: `32' 6"`,
  wid: `18'`,
  nlen: `12'`,
  nwid: `8'`,
  pts: samplePoints,
  roll: 15,
  max: '100',
  grain: 'auto',
  angle: '',
  use: 'landscape',
  from: '',
  to: '',
  // What each edge meets: the rectangle's N, E, S, W; the L's six edges; one for all points.
  redges: ['unknown', 'unknown', 'unknown', 'unknown'],
  ledges: ['unknown', 'unknown', 'unknown', 'unknown', 'unknown', 'unknown'],
  pedge: 'unknown',
} as const satisfies Record<string, string | number | readonly EdgeChoice[]>;

/**
 * The same yard for a metric company, typed in metres: about 10 × 5.5 m, the L in whole metres,
 * a 30 m longest piece (a 100 ft roll is 30.48 m).
 */
const metricSamplePoints = ['0, 0', '12, 0', '12, 4.5', '6, 4.5', '6, 9', '0, 9'].join('\n');
export const metricLayoutParamDefaults = {
  ...layoutParamDefaults,
  len: '10 m',
  wid: '5.5 m',
  nlen: '3.5 m',
  nwid: '2.5 m',
  pts: metricSamplePoints,
  max: '30 m',
} as const satisfies Record<keyof typeof layoutParamDefaults, unknown>;

type LayoutDefaults = typeof layoutParamDefaults | typeof metricLayoutParamDefaults;

/** The defaults in the company's units, so a metric company's form opens in metres. */
export function layoutParamDefaultsFor(system: MeasurementSystem): LayoutDefaults {
  return system === 'metric' ? metricLayoutParamDefaults : layoutParamDefaults;
}

/** Typed text is kept as typed (even when it does not parse) so a reload shows the same form. */
const typed = (fallback: string, maxLength = 40) => z.string().max(maxLength).catch(fallback);

const edgeChoice = z.enum(edgeChoices).catch('unknown');

/**
 * Edge choices written as a comma-separated list (`bed,unknown,…`). A word it does not know
 * reads as "Not sure"; a list of the wrong length falls back to all "Not sure".
 */
const edgeList = (fallback: readonly EdgeChoice[]) =>
  z
    .string()
    .transform((text) => text.split(','))
    .pipe(z.array(edgeChoice).length(fallback.length))
    .catch(() => [...fallback]);

/**
 * The layout screen's state as it lives in the URL. Anything unreadable falls back to its
 * default field by field, so an old or hand-edited link still opens a plan.
 */
function buildParamsSchema(defaults: LayoutDefaults) {
  return z.object({
    shape: z.enum(shapeKinds).catch(defaults.shape),
    len: typed(defaults.len),
    wid: typed(defaults.wid),
    nlen: typed(defaults.nlen),
    nwid: typed(defaults.nwid),
    // Room for a few hundred vertices typed as "x, y" lines.
    pts: typed(defaults.pts, 12_000),
    roll: z.coerce.number().pipe(z.literal(rollWidthsFt)).catch(defaults.roll),
    max: typed(defaults.max),
    grain: z.enum(grainChoices).catch(defaults.grain),
    angle: typed(defaults.angle),
    use: z.enum(usages).catch(defaults.use),
    from: typed(defaults.from),
    to: typed(defaults.to),
    redges: edgeList(defaults.redges),
    ledges: edgeList(defaults.ledges),
    pedge: edgeChoice,
  });
}

const schemas = {
  imperial: buildParamsSchema(layoutParamDefaults),
  metric: buildParamsSchema(metricLayoutParamDefaults),
};
export const layoutParamsSchema = schemas.imperial;
export type LayoutParams = z.output<typeof layoutParamsSchema>;

/** Reads the screen's state from the URL's search params. */
export function parseLayoutParams(
  search: URLSearchParams,
  system: MeasurementSystem = 'imperial',
): LayoutParams {
  return schemas[system].parse(Object.fromEntries(search));
}

/** Writes the state back, leaving out defaults (and fields the chosen shape does not use). */
export function toLayoutSearchParams(
  params: LayoutParams,
  system: MeasurementSystem = 'imperial',
): URLSearchParams {
  const defaults = layoutParamDefaultsFor(system);
  const usedByShape: Record<ShapeKind, ReadonlySet<string>> = {
    rectangle: new Set(['len', 'wid', 'redges']),
    'l-shape': new Set(['len', 'wid', 'nlen', 'nwid', 'ledges']),
    points: new Set(['pts', 'pedge']),
  };
  const shapeFields = new Set(['len', 'wid', 'nlen', 'nwid', 'pts', 'redges', 'ledges', 'pedge']);
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params) as Array<
    [keyof LayoutParams, string | number | readonly EdgeChoice[]]
  >) {
    if (shapeFields.has(key) && !usedByShape[params.shape].has(key)) continue;
    if (key === 'angle' && params.grain !== 'angle') continue;
    // String() writes a list comma-separated, as edgeList reads it back.
    if (String(value) === String(defaults[key])) continue;
    search.set(key, String(value));
  }
  return search;
}
