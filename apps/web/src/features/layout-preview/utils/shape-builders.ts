import type { LayoutPoint } from '@seamwright/takeoff';
import { readLength, readPoint, type Read } from './read-input';

/** Messages per field name, for the fields that could not be read. */
export type FieldErrors = Partial<Record<string, string>>;

/** An outline in feet (x east, y north), or why the typed fields do not make one. */
export type ShapeResult =
  { ok: true; outer: LayoutPoint[]; holes: LayoutPoint[][] } | { ok: false; errors: FieldErrors };

function collect(fields: Record<string, Read<number>>): {
  values: Record<string, number>;
  errors: FieldErrors;
} {
  const values: Record<string, number> = {};
  const errors: FieldErrors = {};
  for (const [name, read] of Object.entries(fields)) {
    if (read.ok) values[name] = read.value;
    else errors[name] = read.message;
  }
  return { values, errors };
}

/**
 * A rectangle with its length running north–south and its width east–west, south-west
 * corner at 0, 0.
 */
export function buildRectangle(lengthText: string, widthText: string): ShapeResult {
  const { values, errors } = collect({ len: readLength(lengthText), wid: readLength(widthText) });
  const { len, wid } = values;
  if (len === undefined || wid === undefined) return { ok: false, errors };
  return {
    ok: true,
    outer: [
      [0, 0],
      [wid, 0],
      [wid, len],
      [0, len],
    ],
    holes: [],
  };
}

/**
 * An L: the overall rectangle (length north–south, width east–west) with a notch cut out of
 * its north-east corner. The notch must leave turf on both arms.
 */
export function buildLShape(
  lengthText: string,
  widthText: string,
  notchLengthText: string,
  notchWidthText: string,
): ShapeResult {
  const { values, errors } = collect({
    len: readLength(lengthText),
    wid: readLength(widthText),
    nlen: readLength(notchLengthText),
    nwid: readLength(notchWidthText),
  });
  const { len, wid, nlen, nwid } = values;
  if (len !== undefined && nlen !== undefined && nlen >= len)
    errors.nlen = 'The notch must be shorter than the overall length';
  if (wid !== undefined && nwid !== undefined && nwid >= wid)
    errors.nwid = 'The notch must be narrower than the overall width';
  if (
    len === undefined ||
    wid === undefined ||
    nlen === undefined ||
    nwid === undefined ||
    Object.keys(errors).length > 0
  )
    return { ok: false, errors };
  return {
    ok: true,
    outer: [
      [0, 0],
      [wid, 0],
      [wid, len - nlen],
      [wid - nwid, len - nlen],
      [wid - nwid, len],
      [0, len],
    ],
    holes: [],
  };
}

const ringWord = /^\s*hole\s*$/i;

/**
 * Points typed one per line as `x, y` in feet; blank lines are skipped. A line reading `hole`
 * starts a hole (a planter, a tree ring) whose points follow.
 */
export function buildFromPoints(text: string): ShapeResult {
  const rings: LayoutPoint[][] = [[]];
  for (const [index, line] of text.split(/\r?\n/).entries()) {
    if (line.trim() === '') continue;
    if (ringWord.test(line)) {
      rings.push([]);
      continue;
    }
    const point = readPoint(line);
    if (!point.ok) return { ok: false, errors: { pts: `Line ${index + 1}: ${point.message}` } };
    rings[rings.length - 1]?.push(point.value);
  }
  const [outer = [], ...holes] = rings;
  if (outer.length < 3)
    return {
      ok: false,
      errors: {
        pts: `An outline needs at least 3 points; there ${outer.length === 1 ? 'is 1' : `are ${outer.length}`}`,
      },
    };
  const shortHole = holes.findIndex((hole) => hole.length < 3);
  if (shortHole >= 0)
    return { ok: false, errors: { pts: `Hole ${shortHole + 1} needs at least 3 points` } };
  return { ok: true, outer, holes };
}

/** Points as the textarea shows them, rounded to hundredths of a foot. */
export function pointsToText(points: readonly LayoutPoint[]): string {
  const round = (value: number) => String(Math.round(value * 100) / 100);
  return points.map(([x, y]) => `${round(x)}, ${round(y)}`).join('\n');
}
