import type { EdgeTag } from '@seamwright/takeoff';

/** A point in feet: x to the east, y to the north (the planner's frame). */
export type Pt = readonly [number, number];

/** What a hole is, for its label on screen (the planner treats every hole alike). */
export type HoleKind = 'planter' | 'tree' | 'other';

/** A closed ring with one tag and one tight-curve mark per side (side i runs from point i to i + 1). */
export interface EditorRing {
  readonly points: readonly Pt[];
  readonly tags: readonly (EdgeTag | null)[];
  readonly curved: readonly boolean[];
}

export interface EditorHole extends EditorRing {
  readonly kind: HoleKind;
}

/** A walkway: an open polyline and its width. */
export interface EditorPath {
  readonly points: readonly Pt[];
  readonly widthFt: number;
}

/** Everything undo and redo restore: the drawing itself. */
export interface EditorDoc {
  readonly outer: EditorRing;
  readonly holes: readonly EditorHole[];
  readonly paths: readonly EditorPath[];
}

/** Which line is being edited: the outline, a hole or a walkway. */
export type LineRef =
  | { readonly kind: 'outer' }
  | { readonly kind: 'hole'; readonly index: number }
  | { readonly kind: 'path'; readonly index: number };

export interface Snapping {
  /** Grid step in feet; null = no grid snap. */
  readonly gridFt: number | null;
  /** Square up to 90° and 45° against the neighbouring points. */
  readonly angles: boolean;
}

/** Why the last edit was refused; the screen words it in the company's units. */
export type Refusal =
  | { readonly kind: 'crossing'; readonly line: LineRef; readonly at: Pt }
  | { readonly kind: 'duplicate'; readonly line: LineRef }
  | { readonly kind: 'too-few'; readonly line: LineRef; readonly min: number }
  | { readonly kind: 'zero-length' };

export interface EditorState {
  readonly doc: EditorDoc;
  readonly past: readonly EditorDoc[];
  readonly future: readonly EditorDoc[];
  /** The line new points go to. */
  readonly active: LineRef;
  /** The selected point of the active line, or null. */
  readonly selected: number | null;
  readonly snapping: Snapping;
  readonly refusal: Refusal | null;
  /** The drawing when a drag began, so the whole drag is one undo step. */
  readonly dragOrigin: EditorDoc | null;
}

export const OUTER: LineRef = { kind: 'outer' };

export function sameLine(a: LineRef, b: LineRef): boolean {
  if (a.kind === 'outer' || b.kind === 'outer') return a.kind === b.kind;
  return a.kind === b.kind && a.index === b.index;
}
