import { findSelfContact } from '@seamwright/takeoff';
import { samePoint } from './ring-edits';
import type { EditorDoc, EditorPath, EditorRing, LineRef, Pt, Refusal } from './types';

/** The line a reference points at, or undefined when it no longer exists. */
export function lineOf(doc: EditorDoc, line: LineRef): EditorRing | EditorPath | undefined {
  if (line.kind === 'outer') return doc.outer;
  if (line.kind === 'hole') return doc.holes[line.index];
  return doc.paths[line.index];
}

export function isClosed(line: LineRef): boolean {
  return line.kind !== 'path';
}

/** The points on either side of point `index` (previous first), for snapping. */
export function neighboursOf(points: readonly Pt[], index: number, closed: boolean): Pt[] {
  const n = points.length;
  const result: Pt[] = [];
  const before = closed ? (index - 1 + n) % n : index - 1;
  const after = closed ? (index + 1) % n : index + 1;
  const prev = points[before];
  const next = points[after];
  if (prev && before !== index) result.push(prev);
  if (next && after !== index && after !== before) result.push(next);
  return result;
}

/** Replaces one line of the drawing (rings for the outline and holes, a walkway for paths). */
export function withLine(
  doc: EditorDoc,
  line: LineRef,
  update: (current: EditorRing | EditorPath) => EditorRing | EditorPath,
): EditorDoc {
  if (line.kind === 'outer') return { ...doc, outer: update(doc.outer) as EditorRing };
  if (line.kind === 'hole')
    return {
      ...doc,
      holes: doc.holes.map((hole, i) =>
        i === line.index ? { ...hole, ...(update(hole) as EditorRing) } : hole,
      ),
    };
  return {
    ...doc,
    paths: doc.paths.map((path, i) => (i === line.index ? (update(path) as EditorPath) : path)),
  };
}

/**
 * Why a line's points cannot stand, or null: two neighbouring points on top of each other,
 * or (for the outline and holes, from 4 points up) sides that cross or touch, checked with
 * the planner's own test so the editor refuses exactly what the planner would.
 */
export function lineRefusal(points: readonly Pt[], line: LineRef): Refusal | null {
  const closed = isClosed(line);
  const n = points.length;
  for (let i = 0; i < n; i += 1) {
    const next = closed ? (i + 1) % n : i + 1;
    if (next !== i && samePoint(points[i], points[next])) return { kind: 'duplicate', line };
  }
  if (!closed || n < 4) return null;
  const at = findSelfContact(points);
  return at ? { kind: 'crossing', line, at } : null;
}
