import type { LayoutPoint } from '@seamwright/takeoff';
import type { NamedEdge } from './edge-tags';
import { feetToMetres } from '@seamwright/takeoff';
import { unitsFor, type Units } from '../../../lib/units';
import { readLength, readPoint, type Read } from './read-input';

const imperial = unitsFor('imperial');

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
 * corner at 0, 0. The ring runs counter-clockwise from there: edge 0 is the south side,
 * 1 the east, 2 the north, 3 the west.
 */
export function buildRectangle(
  lengthText: string,
  widthText: string,
  units: Units = imperial,
): ShapeResult {
  const { values, errors } = collect({
    len: readLength(lengthText, units),
    wid: readLength(widthText, units),
  });
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

/** The rectangle's sides as the screen lists them (N, E, S, W), with their edges in its ring. */
export const rectangleEdges: readonly NamedEdge[] = [
  { label: 'North edge', ringEdge: 2 },
  { label: 'East edge', ringEdge: 1 },
  { label: 'South edge', ringEdge: 0 },
  { label: 'West edge', ringEdge: 3 },
];

/**
 * An L: the overall rectangle (length north–south, width east–west) with a notch cut out of
 * its north-east corner. The notch must leave turf on both arms. The ring runs
 * counter-clockwise from the south-west corner: south side, east side of the south arm, the
 * notch's north-facing side, the notch's east-facing side, north side of the west arm, west
 * side.
 */
export function buildLShape(
  lengthText: string,
  widthText: string,
  notchLengthText: string,
  notchWidthText: string,
  units: Units = imperial,
): ShapeResult {
  const { values, errors } = collect({
    len: readLength(lengthText, units),
    wid: readLength(widthText, units),
    nlen: readLength(notchLengthText, units),
    nwid: readLength(notchWidthText, units),
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

/**
 * The L's six sides as the screen lists them (north round to west), with their edges in its
 * ring. The north edge's east part and the east edge's north part are the notch's sides.
 */
export const lShapeEdges: readonly NamedEdge[] = [
  { label: 'North edge (west part)', ringEdge: 4 },
  { label: 'North edge (east part)', ringEdge: 2 },
  { label: 'East edge (north part)', ringEdge: 3 },
  { label: 'East edge (south part)', ringEdge: 1 },
  { label: 'South edge', ringEdge: 0 },
  { label: 'West edge', ringEdge: 5 },
];

const ringWord = /^\s*hole\s*$/i;

/**
 * Drops a point typed twice in a row and a closing point repeating the first, as the planner
 * does, so the ring sent has exactly the edges the planner counts (edge tags go one per edge).
 */
function dropRepeatedPoints(ring: readonly LayoutPoint[]): LayoutPoint[] {
  const same = (a: LayoutPoint | undefined, b: LayoutPoint | undefined) =>
    a !== undefined && b !== undefined && a[0] === b[0] && a[1] === b[1];
  const kept = ring.filter((point, i) => !same(point, ring[i - 1]));
  if (kept.length > 1 && same(kept[0], kept[kept.length - 1])) kept.pop();
  return kept;
}

/**
 * Points typed one per line as `x, y` in the company's unit; blank lines are skipped. A line reading `hole`
 * starts a hole (a planter, a tree ring) whose points follow.
 */
export function buildFromPoints(text: string, units: Units = imperial): ShapeResult {
  const rings: LayoutPoint[][] = [[]];
  for (const [index, line] of text.split(/\r?\n/).entries()) {
    if (line.trim() === '') continue;
    if (ringWord.test(line)) {
      rings.push([]);
      continue;
    }
    const point = readPoint(line, units);
    if (!point.ok) return { ok: false, errors: { pts: `Line ${index + 1}: ${point.message}` } };
    rings[rings.length - 1]?.push(point.value);
  }
  const [outer = [], ...holes] = rings.map(dropRepeatedPoints);
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

/**
 * Points (in feet) as the textarea shows them in the company's unit, rounded to hundredths
 * (of a foot, or of a metre: whole centimetres).
 */
export function pointsToText(points: readonly LayoutPoint[], units: Units = imperial): string {
  const inUnit = (feet: number) => (units.system === 'metric' ? feetToMetres(feet) : feet);
  const round = (value: number) => String(Math.round(inUnit(value) * 100) / 100);
  return points.map(([x, y]) => `${round(x)}, ${round(y)}`).join('\n');
}
