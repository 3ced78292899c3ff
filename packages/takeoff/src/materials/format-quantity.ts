import { sqFtToSqM, sqYdToSqFt, feetToMetres } from '../units/conversions.js';
import { formatNumber } from '../units/format-length.js';
import type { MeasurementSystem } from '../units/parse-length.js';
import type { TakeoffUnit } from './takeoff-line.js';

/** Units spelled as counted words, which read singular for exactly one ("1 load", "2 loads"). */
const singular: Partial<Record<TakeoffUnit, string>> = {
  tons: 'ton',
  bags: 'bag',
  rolls: 'roll',
  boards: 'board',
  loads: 'load',
  hours: 'hour',
  days: 'day',
};

/**
 * A takeoff quantity with its unit as people say it: `1 load`, `2 loads`, `5.85 cu yd`, `90 %`.
 * Abbreviated units (sq ft, cu yd, lb, ea, lf, gal, in) never change.
 */
export function formatQuantity(quantity: number, unit: TakeoffUnit, maxDecimals = 2): string {
  const number = formatNumber(quantity, maxDecimals);
  const word = quantity === 1 ? (singular[unit] ?? unit) : unit;
  return `${number} ${word}`;
}

/**
 * {@link formatQuantity} in the company's system: for metric companies areas (sq ft, sq yd)
 * show in m² and linear feet in m; counts, volumes and weights keep the unit they are sold in.
 */
export function formatQuantityIn(
  system: MeasurementSystem,
  quantity: number,
  unit: TakeoffUnit,
  maxDecimals = 2,
): string {
  if (system === 'metric') {
    if (unit === 'sq ft') return `${formatNumber(sqFtToSqM(quantity), maxDecimals)} m²`;
    if (unit === 'sq yd') return `${formatNumber(sqFtToSqM(sqYdToSqFt(quantity)), maxDecimals)} m²`;
    if (unit === 'lf') return `${formatNumber(feetToMetres(quantity), maxDecimals)} m`;
  }
  return formatQuantity(quantity, unit, maxDecimals);
}
