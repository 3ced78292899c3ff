import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { labourLines, rodentWireLines, sprinklerCapLines } from './extra-lines.js';

/** Sprinkler caps, rodent wire, then labour and the equipment the job's work calls for. */
export function extraLinesFor(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const needs = new Set<string>();
  if ((input.digDepthIn ?? settings.excavation.digDepthIn) > 0) needs.add('excavation');
  if ((input.baseDepthIn ?? settings.base.depthIn) > 0) needs.add('base');
  if (settings.infill[input.usage].layers.length > 0) needs.add('infill');
  return [
    ...sprinklerCapLines(input, settings),
    ...rodentWireLines(input, settings),
    ...labourLines(input, settings, needs),
  ];
}
