import type { EdgeTag } from '@seamwright/takeoff';
import type { OutlineTemplate } from './templates';
import type { EditorDoc, HoleKind, LineRef, Pt, Snapping } from './types';

/** Everything the area editor can do; the canvas, the lists and the keyboard all send these. */
export type EditorAction =
  /** A click on the drawing: a new point after the selected one (or at the end), snapped. */
  | { type: 'addPoint'; point: Pt; toleranceFt: number }
  /** Typed drawing: a side of `lengthFt` in direction `angleDeg` from the last point. */
  | { type: 'appendSide'; angleDeg: number; lengthFt: number }
  | { type: 'select'; line: LineRef; index: number | null }
  | { type: 'selectStep'; step: 1 | -1 }
  /** Points typed into the list go exactly where typed (no snapping). */
  | { type: 'movePoint'; index: number; point: Pt }
  | { type: 'dragStart'; line: LineRef; index: number }
  | { type: 'dragMove'; point: Pt; toleranceFt: number }
  | { type: 'dragEnd' }
  | { type: 'nudge'; dx: number; dy: number }
  | { type: 'deletePoint'; index?: number }
  /** A new point half-way along side `index` of the active line. */
  | { type: 'splitSide'; index: number }
  | { type: 'setSideLength'; index: number; lengthFt: number }
  | { type: 'setSideAngle'; index: number; angleDeg: number }
  | { type: 'setTag'; line: LineRef; index: number; tag: EdgeTag | null }
  | { type: 'setAllTags'; tag: EdgeTag | null }
  | { type: 'setCurved'; line: LineRef; index: number; curved: boolean }
  | { type: 'template'; template: OutlineTemplate }
  /** A planter or tree ring in the middle of the outline, or an empty hole to click in. */
  | { type: 'addHole'; kind: HoleKind; shape: 'template' | 'empty' }
  | { type: 'setHoleKind'; index: number; kind: HoleKind }
  | { type: 'addPath' }
  | { type: 'setPathWidth'; index: number; widthFt: number }
  | { type: 'removeLine'; line: LineRef }
  | { type: 'setSnapping'; snapping: Snapping }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'dismissRefusal' }
  /** A saved area opened for editing: a fresh history. */
  | { type: 'load'; doc: EditorDoc };
