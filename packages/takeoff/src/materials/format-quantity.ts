import { formatNumber } from '../units/format-length.js';
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
