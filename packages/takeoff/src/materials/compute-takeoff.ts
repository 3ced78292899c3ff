import { takeoffSettingsSchema } from '../settings/takeoff-settings-schema.js';
import type { TakeoffSettings } from '../settings/takeoff-settings-schema.js';
import { planEdges } from './lines/edge-plan.js';
import { extraLinesFor } from './lines/extra-lines-for.js';
import {
  edgingLines,
  perimeterNailLines,
  petPerimeterLines,
  seamNailLines,
} from './lines/fastener-lines.js';
import { infillLines } from './lines/infill-lines.js';
import { seamLines } from './lines/seam-lines.js';
import { baseLines, excavationLines, finishHeightLines } from './lines/site-lines.js';
import { rollWeightLines, turfLines } from './lines/turf-lines.js';
import { takeoffInputSchema } from './takeoff-input.js';
import type { TakeoffInput } from './takeoff-input.js';
import type { TakeoffLine } from './takeoff-line.js';

/**
 * The material takeoff for one turf area: every line carries its rule with the numbers put in,
 * the inputs it used, the raw value and how it was rounded. Both arguments are validated (a
 * ZodError names any bad field), so every quantity comes out finite and never negative.
 *
 * Lines, in order: turf, roll weight, excavation spoil and haul loads, base stone (volume and
 * tons), compaction note, finish-height guidance, perimeter nails, seam nails, seam tape and
 * adhesive, edging (stakes, staples), pet perimeter boards and screws, sprinkler caps, infill
 * per layer and in total, rodent wire, labour and equipment days. Lines that do not apply are
 * left out (e.g. seam nails when the company glues seams only).
 */
export function computeTakeoff(input: TakeoffInput, settings: TakeoffSettings): TakeoffLine[] {
  const job = takeoffInputSchema.parse(input);
  const rules = takeoffSettingsSchema.parse(settings);
  const edges = planEdges(job, rules);
  return [
    ...turfLines(job),
    ...rollWeightLines(job, rules),
    ...excavationLines(job, rules),
    ...baseLines(job, rules),
    ...finishHeightLines(job, rules),
    ...perimeterNailLines(job, rules, edges),
    ...seamNailLines(job, rules),
    ...seamLines(job, rules),
    ...edgingLines(rules, edges),
    ...petPerimeterLines(rules, edges),
    ...infillLines(job, rules),
    ...extraLinesFor(job, rules),
  ];
}

/** Every warning on the takeoff's lines, with the line it came from. */
export function takeoffWarnings(lines: readonly TakeoffLine[]): { key: string; message: string }[] {
  return lines.flatMap((line) => line.warnings.map((message) => ({ key: line.key, message })));
}
