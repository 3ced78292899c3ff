/** Units a takeoff line is counted in. */
export type TakeoffUnit =
  | 'sq ft'
  | 'sq yd'
  | 'cu yd'
  | 'tons'
  | 'lb'
  | 'bags'
  | 'ea'
  | 'lf'
  | 'rolls'
  | 'gal'
  | 'boards'
  | 'loads'
  | 'hours'
  | 'days'
  | 'in'
  | '%';

/**
 * What a line is: something to buy, a haul, crew time, rented equipment, a note for the crew
 * (e.g. the compaction target) or guidance with numbers (e.g. base grade below hardscape).
 */
export type TakeoffLineKind = 'material' | 'haul' | 'labour' | 'equipment' | 'note' | 'guidance';

/** A quantity the user typed over the computed one; the computed value stays visible. */
export interface TakeoffLineOverride {
  quantity: number;
  computedQuantity: number;
  note?: string;
}

/** One explainable line of the takeoff. */
export interface TakeoffLine {
  /** Stable key, e.g. `base-stone-tons` or `infill:zeolite`; overrides refer to it. */
  key: string;
  kind: TakeoffLineKind;
  label: string;
  /** The quantity to order or plan for, after rounding (or the user's override). */
  quantity: number;
  unit: TakeoffUnit;
  /** The exact computed value before rounding. */
  rawQuantity: number;
  /** The rule in plain words with the numbers put in. */
  rule: string;
  /** How `rawQuantity` became `quantity`. */
  rounding: string;
  /** The numbers the rule used, by name. */
  inputs: Record<string, number | string>;
  /** Things a person should look at (out-of-range rates, heavy rolls, weight-limited hauls). */
  warnings: string[];
  override?: TakeoffLineOverride;
}
