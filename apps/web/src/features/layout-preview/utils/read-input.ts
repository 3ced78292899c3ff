import { parseLength } from '@seamwright/takeoff';
import type { LayoutPoint } from '@seamwright/takeoff';

/** A value read from a field, or the message to show under it. */
export type Read<T> = { ok: true; value: T } | { ok: false; message: string };

/** A length typed as the trade types it (`27' 6"`, `27 ft 6 in`, `27.5`), in feet; must be above zero. */
export function readLength(text: string): Read<number> {
  const result = parseLength(text, { system: 'imperial' });
  if (!result.ok) return { ok: false, message: result.error.message };
  if (result.feet <= 0) return { ok: false, message: 'A length must be more than 0' };
  return { ok: true, value: result.feet };
}

const plainNumber = /^[-\u2212]?(\d+(\.\d*)?|\.\d+)$/;

/** One coordinate: a plain number (may be negative, measured from a corner) or a length like `12' 6"`. */
function readCoordinate(text: string): Read<number> {
  const trimmed = text.trim();
  if (plainNumber.test(trimmed)) return { ok: true, value: Number(trimmed.replace('\u2212', '-')) };
  const result = parseLength(trimmed, { system: 'imperial' });
  return result.ok
    ? { ok: true, value: result.feet }
    : { ok: false, message: result.error.message };
}

/** `x, y` (or `x y`) in feet → a point. */
export function readPoint(text: string): Read<LayoutPoint> {
  const parts = text.includes(',') ? text.split(',') : text.trim().split(/\s+/);
  if (parts.length !== 2 || parts.some((part) => part.trim() === ''))
    return { ok: false, message: 'Write a point as x, y in feet, such as 12, 7.5' };
  const [x, y] = parts.map(readCoordinate) as [Read<number>, Read<number>];
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
