import type { EdgeTag } from '@seamwright/takeoff';
import type { Units } from '../../../lib/units';
import type { DrawingProblem } from './measure';
import type { EditorDoc, HoleKind, LineRef, Pt, Refusal } from './types';

/** What a side can meet, in the planner's tags; "Not sure" is sent as no tag. */
export const tagLabels: Record<EdgeTag, string> = {
  hard: 'Hard surface',
  bed: 'Planting bed',
  lawn: 'Lawn',
  fence: 'Fence or wall',
  house: 'House',
};
export const tagOrder: readonly EdgeTag[] = ['hard', 'bed', 'lawn', 'fence', 'house'];

export const holeKindLabels: Record<HoleKind, string> = {
  planter: 'Planter',
  tree: 'Tree ring',
  other: 'Hole',
};

/** The eight compass directions as angles counter-clockwise from east. */
export const compassDirections: readonly { label: string; angleDeg: number }[] = [
  { label: 'East', angleDeg: 0 },
  { label: 'North-east', angleDeg: 45 },
  { label: 'North', angleDeg: 90 },
  { label: 'North-west', angleDeg: 135 },
  { label: 'West', angleDeg: 180 },
  { label: 'South-west', angleDeg: 225 },
  { label: 'South', angleDeg: 270 },
  { label: 'South-east', angleDeg: 315 },
];

/** "North", or "37° (near north-east)" for an angle between the eight. */
export function directionWords(angleDeg: number): string {
  const exact = compassDirections.find((d) => Math.abs(d.angleDeg - angleDeg) < 1e-6);
  if (exact) return exact.label;
  const nearest =
    compassDirections[Math.round((((angleDeg % 360) + 360) % 360) / 45) % 8] ??
    compassDirections[0];
  return `${Math.round(angleDeg * 10) / 10}° (near ${nearest?.label.toLowerCase() ?? 'east'})`;
}

export function lineName(doc: EditorDoc, line: LineRef): string {
  if (line.kind === 'outer') return 'Outline';
  if (line.kind === 'path') return `Walkway ${line.index + 1}`;
  const kind = doc.holes[line.index]?.kind ?? 'other';
  return `${holeKindLabels[kind]} ${line.index + 1}`;
}

/** A point in the company's units: "(20' 0" east, 15' 0" north)". */
export function pointWords(point: Pt, units: Units): string {
  const part = (value: number, plus: string, minus: string) =>
    `${units.length(Math.abs(value))} ${value < 0 ? minus : plus}`;
  return `${part(point[0], 'east', 'west')}, ${part(point[1], 'north', 'south')}`;
}

export function refusalMessage(refusal: Refusal, doc: EditorDoc, units: Units): string {
  switch (refusal.kind) {
    case 'crossing':
      return `Not done: the ${lineName(doc, refusal.line).toLowerCase()} would cross itself near ${pointWords(refusal.at, units)} of the start. Put the point somewhere else or undo the last change.`;
    case 'duplicate':
      return `Not done: that puts two points of the ${lineName(doc, refusal.line).toLowerCase()} on the same spot.`;
    case 'too-few':
      return `Not done: the ${lineName(doc, refusal.line).toLowerCase()} needs at least ${refusal.min} points.`;
    case 'zero-length':
      return 'Not done: a side needs a length greater than zero.';
  }
}

const ringWord = (path: string, doc: EditorDoc): string => {
  const match = /^area\.holes\[(\d+)\]$/.exec(path);
  if (!match) return 'The outline';
  const drawn = doc.holes.filter((hole) => hole.points.length > 0);
  const hole = drawn[Number(match[1])];
  const index = hole ? doc.holes.indexOf(hole) : Number(match[1]);
  return lineName(doc, { kind: 'hole', index });
};

/** Why the drawing cannot be saved yet, in words. */
export function problemMessage(problem: DrawingProblem, doc: EditorDoc, units: Units): string {
  switch (problem.kind) {
    case 'no-outline':
      return 'Draw the outline first: at least 3 points, or start from a rectangle, an L or a circle.';
    case 'short-path':
      return `Walkway ${problem.index + 1} needs a second point (or remove it).`;
    case 'ring':
      // The planner names points in feet as "(x, y)"; shown here in the company's units.
      return `${ringWord(problem.path, doc)}: ${problem.detail.replace(
        /(?:at )?\((-?[\d.]+), (-?[\d.]+)\)/,
        (_, x: string, y: string) =>
          `near ${pointWords([Number(x), Number(y)], units)} of the start`,
      )}.`;
  }
}
