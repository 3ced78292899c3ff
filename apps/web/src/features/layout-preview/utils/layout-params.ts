import { z } from 'zod';
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
export const layoutParamsSchema = z.object({
  shape: z.enum(shapeKinds).catch(layoutParamDefaults.shape),
  len: typed(layoutParamDefaults.len),
  wid: typed(layoutParamDefaults.wid),
  nlen: typed(layoutParamDefaults.nlen),
  nwid: typed(layoutParamDefaults.nwid),
  // Room for a few hundred vertices typed as "x, y" lines.
  pts: typed(layoutParamDefaults.pts, 12_000),
  roll: z.coerce.number().pipe(z.literal(rollWidthsFt)).catch(layoutParamDefaults.roll),
  max: typed(layoutParamDefaults.max),
  grain: z.enum(grainChoices).catch(layoutParamDefaults.grain),
  angle: typed(layoutParamDefaults.angle),
  use: z.enum(usages).catch(layoutParamDefaults.use),
  from: typed(layoutParamDefaults.from),
  to: typed(layoutParamDefaults.to),
  redges: edgeList(layoutParamDefaults.redges),
  ledges: edgeList(layoutParamDefaults.ledges),
  pedge: edgeChoice,
});
export type LayoutParams = z.output<typeof layoutParamsSchema>;

/** Reads the screen's state from the URL's search params. */
export function parseLayoutParams(search: URLSearchParams): LayoutParams {
  return layoutParamsSchema.parse(Object.fromEntries(search));
}

/** Writes the state back, leaving out defaults (and fields the chosen shape does not use). */
export function toLayoutSearchParams(params: LayoutParams): URLSearchParams {
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
    if (String(value) === String(layoutParamDefaults[key])) continue;
    search.set(key, String(value));
  }
  return search;
}
