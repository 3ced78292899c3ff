import type { LayoutPoint } from '@seamwright/takeoff';
import { unitsFor, type Units } from '../../../lib/units';

/** A value read from a field, or the message to show under it. */
export type Read<T> = { ok: true; value: T } | { ok: false; message: string };

const imperial = unitsFor('imperial');

/**
 * A length typed as the company types it (`27' 6"`, `27 ft 6 in`, `27.5`; `8.4 m` or `8.4` for a
 * metric company), in feet; must be above zero.
 */
export function readLength(text: string, units: Units = imperial): Read<number> {
  const result = units.parseLength(text);
  if (!result.ok) return { ok: false, message: result.error.message };
  if (result.feet <= 0) return { ok: false, message: 'A length must be more than 0' };
  return { ok: true, value: result.feet };
}

const plainNumber = /^[-\u2212]?(\d+(\.\d*)?|\.\d+)$/;

/**
 * One coordinate: a plain number in the company's unit (may be negative, measured from a
 * corner) or a length with its unit such as `12' 6"` or `3.5 m`; in feet.
 */
function readCoordinate(text: string, units: Units): Read<number> {
  const trimmed = text.trim();
  if (plainNumber.test(trimmed))
    return { ok: true, value: units.numberToFeet(Number(trimmed.replace('\u2212', '-'))) };
  const result = units.parseLength(trimmed);
  return result.ok
    ? { ok: true, value: result.feet }
    : { ok: false, message: result.error.message };
}

/** `x, y` (or `x y`) in the company's unit → a point in feet. */
export function readPoint(text: string, units: Units = imperial): Read<LayoutPoint> {
  const parts = text.includes(',') ? text.split(',') : text.trim().split(/\s+/);
  if (parts.length !== 2 || parts.some((part) => part.trim() === ''))
    return {
      ok: false,
      message: `Write a point as x, y in ${units.lengthWord}, such as ${units.system === 'metric' ? '4, 2.5' : '12, 7.5'}`,
    };
  const [x, y] = parts.map((part) => readCoordinate(part, units)) as [Read<number>, Read<number>];
  if (!x.ok) return { ok: false, message: `x: ${x.message}` };
  if (!y.ok) return { ok: false, message: `y: ${y.message}` };
  return { ok: true, value: [x.value, y.value] };
}

/** A typed grain angle in degrees, counter-clockwise from east (0 = runs east, 90 = runs north). */
export function readAngle(text: string): Read<number> {
  const trimmed = text.trim().replace(/°$/, '').trim();
  if (trimmed === '') return { ok: false, message: 'Enter an angle in degrees, such as 45' };
  if (!plainNumber.test(trimmed))
    return { ok: false, message: `"${text}" is not an angle; type degrees, such as 45` };
  const value = Number(trimmed.replace('\u2212', '-'));
  if (value < -360 || value > 360)
    return { ok: false, message: 'Give an angle between −360° and 360°' };
  return { ok: true, value };
}
