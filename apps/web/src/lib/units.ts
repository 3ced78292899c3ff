import {
  formatArea,
  formatLength,
  formatLengthRange,
  formatQuantityIn,
  metresToFeet,
  parseLength,
  type AreaUnit,
  type LengthParseResult,
  type MeasurementSystem,
  type TakeoffUnit,
} from '@seamwright/takeoff';
import { useOptionalSession } from './session';

/**
 * Lengths and areas in the company's measurement system. Everything is stored and planned in
 * feet; only what is typed and shown changes (metres and m² for metric companies).
 */
export interface Units {
  system: MeasurementSystem;
  /** The unit word for hints and labels: `feet` or `metres`. */
  lengthWord: 'feet' | 'metres';
  /** `20' 6"` or `6.25 m`. */
  length: (feet: number) => string;
  /** `0' 0"–15' 0"` or `0–4.57 m`. */
  lengthRange: (fromFeet: number, toFeet: number) => string;
  /** `1,000 sq ft` or `92.9 m²`; an explicit `unit` (sq yd) wins. */
  area: (sqFt: number, unit?: AreaUnit) => string;
  /** A takeoff quantity, with areas and linear feet in metric units for metric companies. */
  quantity: (quantity: number, unit: TakeoffUnit) => string;
  /** Reads a typed length to feet; a bare number is feet or metres by the system. */
  parseLength: (text: string) => LengthParseResult;
  /** What a length box accepts, for its hint. */
  lengthExamples: string;
  /** A plain number the company types for a coordinate, in feet. */
  numberToFeet: (value: number) => number;
}

function buildUnits(system: MeasurementSystem): Units {
  const metric = system === 'metric';
  return {
    system,
    lengthWord: metric ? 'metres' : 'feet',
    length: (feet) => formatLength(feet, { system }),
    lengthRange: (from, to) => formatLengthRange(from, to, { system }),
    area: (sqFt, unit) => formatArea(sqFt, unit ? { unit } : { system }),
    quantity: (quantity, unit) => formatQuantityIn(system, quantity, unit),
    parseLength: (text) => parseLength(text, { system }),
    lengthExamples: metric ? 'Such as 8.4 m, 840 cm or 8.4' : `Such as 27' 6", 27 ft 6 in or 27.5`,
    numberToFeet: (value) => (metric ? metresToFeet(value) : value),
  };
}

const bySystem: Record<MeasurementSystem, Units> = {
  imperial: buildUnits('imperial'),
  metric: buildUnits('metric'),
};

/** The units of a measurement system (the same object each time, safe in hook dependencies). */
export function unitsFor(system: MeasurementSystem): Units {
  return bySystem[system];
}

/** The signed-in company's units; feet and inches outside the signed-in layout. */
export function useUnits(): Units {
  return unitsFor(useOptionalSession()?.company.measurementSystem ?? 'imperial');
}
