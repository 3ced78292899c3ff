import { defaultTakeoffSettings } from '../settings/default-takeoff-settings.js';
import type { TakeoffSettings } from '../settings/takeoff-settings-schema.js';
import { computeTakeoff } from './compute-takeoff.js';
import type { TakeoffInput } from './takeoff-input.js';
import type { TakeoffLine } from './takeoff-line.js';

// Test helpers only (imported by *.test.ts); not exported from the package.

/** A plain 1,000 sq ft landscape area with a 240 lf untagged perimeter and no seams. */
export function jobInput(overrides: Partial<TakeoffInput> = {}): TakeoffInput {
  return {
    usage: 'landscape',
    areaSqFt: 1000,
    perimeterFt: 240,
    seams: { sideFt: 0, buttFt: 0, count: 0 },
    turf: { orderedSqFt: 1050, pieces: [{ widthFt: 15, lengthFt: 70 }] },
    ...overrides,
  };
}

/** Default settings with some groups replaced. */
export function settingsWith(patch: Partial<TakeoffSettings>): TakeoffSettings {
  return { ...defaultTakeoffSettings, ...patch };
}

/** Runs the takeoff and returns the line with `key`, failing loudly if it is missing. */
export function lineOf(
  key: string,
  input: TakeoffInput,
  settings: TakeoffSettings = defaultTakeoffSettings,
): TakeoffLine {
  const line = computeTakeoff(input, settings).find((l) => l.key === key);
  if (!line) throw new Error(`no ${key} line`);
  return line;
}

/** The keys of the takeoff's lines. */
export function keysOf(
  input: TakeoffInput,
  settings: TakeoffSettings = defaultTakeoffSettings,
): string[] {
  return computeTakeoff(input, settings).map((l) => l.key);
}
