import { DEFAULT_WALKWAY_WIDTH_FT } from '@seamwright/takeoff';
import type { EditorAction } from './actions';
import { commit, keepSelectionValid, redo, undo } from './history';
import { placeHole } from './place-hole';
import { isClosed, lineOf, lineRefusal, neighboursOf, withLine } from './lines';
import {
  add,
  emptyRing,
  insertRingPoint,
  moveRingPoint,
  pointAlong,
  removeRingPoint,
  setPathSideLength,
  setRingCurved,
  setRingSideLength,
  setRingTag,
  setSideDirection,
} from './ring-edits';
import { snapPoint } from './snap';
import { outlineTemplate } from './templates';
import {
  OUTER,
  type EditorDoc,
  type EditorPath,
  type EditorRing,
  type EditorState,
  type LineRef,
  type Pt,
} from './types';

export const emptyDoc: EditorDoc = { outer: emptyRing(), holes: [], paths: [] };

export function initialEditorState(doc: EditorDoc = emptyDoc): EditorState {
  return {
    doc,
    past: [],
    future: [],
    active: OUTER,
    selected: null,
    snapping: { gridFt: 0.5, angles: true },
    refusal: null,
    dragOrigin: null,
  };
}

function isRing(line: EditorRing | EditorPath): line is EditorRing {
  return 'tags' in line;
}

/** New points for the active line, refused (with the reason kept) when they cannot stand. */
function setPoints(state: EditorState, line: LineRef, points: readonly Pt[] | null): EditorState {
  if (!points) return { ...state, refusal: { kind: 'zero-length' } };
  const refusal = lineRefusal(points, line);
  if (refusal) return { ...state, refusal };
  return commit(
    state,
    withLine(state.doc, line, (current) => ({ ...current, points })),
  );
}

/** Inserts `point` into the active line at `index`, selecting it. */
function insertPoint(state: EditorState, index: number, point: Pt): EditorState {
  const line = lineOf(state.doc, state.active);
  if (!line) return state;
  const next = isRing(line)
    ? insertRingPoint(line, index, point)
    : { ...line, points: [...line.points.slice(0, index), point, ...line.points.slice(index)] };
  const refusal = lineRefusal(next.points, state.active);
  if (refusal) return { ...state, refusal };
  const doc = withLine(state.doc, state.active, () => next);
  return { ...commit(state, doc), selected: index };
}

/** Where a new point goes in the active line: after the selected point, else at the end. */
function insertIndex(state: EditorState, count: number): number {
  return state.selected === null ? count : state.selected + 1;
}

function editRing(state: EditorState, line: LineRef, edit: (ring: EditorRing) => EditorRing) {
  const current = lineOf(state.doc, line);
  if (!current || !isRing(current)) return state;
  return commit(
    state,
    withLine(state.doc, line, () => edit(current)),
  );
}

function onPoints(state: EditorState, action: EditorAction): EditorState | null {
  const line = lineOf(state.doc, state.active);
  if (!line) return state;
  const { points } = line;
  const closed = isClosed(state.active);
  switch (action.type) {
    case 'addPoint': {
      const index = insertIndex(state, points.length);
      const neighbours = [
        points[index - 1],
        closed ? points[index % points.length] : points[index],
      ].filter((p): p is Pt => p !== undefined);
      const point = snapPoint({ ...action, neighbours, snapping: state.snapping });
      return insertPoint(state, index, point);
    }
    case 'appendSide': {
      if (!(action.lengthFt > 0)) return { ...state, refusal: { kind: 'zero-length' } };
      const started = points.length === 0 ? insertPoint(state, 0, [0, 0]) : state;
      const index = insertIndex(started, points.length === 0 ? 1 : points.length);
      const from = (lineOf(started.doc, started.active)?.points ?? [])[index - 1];
      if (!from) return state;
      const result = insertPoint(
        started,
        index,
        pointAlong(from, action.angleDeg, action.lengthFt),
      );
      // Both points of a first side are one undo step.
      return points.length === 0 && result !== started
        ? { ...result, past: state.past.concat(state.doc) }
        : result;
    }
    case 'movePoint':
      return setPoints(
        state,
        state.active,
        points.map((p, i) => (i === action.index ? action.point : p)),
      );
    case 'nudge': {
      const at = state.selected === null ? undefined : points[state.selected];
      if (!at || state.selected === null) return state;
      return setPoints(
        state,
        state.active,
        moveRingPoint(line, state.selected, add(at, [action.dx, action.dy])).points,
      );
    }
    case 'deletePoint': {
      const index = action.index ?? state.selected;
      if (index === null || index >= points.length) return state;
      const next = isRing(line)
        ? removeRingPoint(line, index)
        : { ...line, points: points.filter((_, i) => i !== index) };
      const refusal = lineRefusal(next.points, state.active);
      if (refusal) return { ...state, refusal };
      const selected = points.length > 1 ? Math.max(0, index - 1) : null;
      return {
        ...commit(
          state,
          withLine(state.doc, state.active, () => next),
        ),
        selected,
      };
    }
    case 'splitSide': {
      const a = points[action.index];
      const b = closed ? points[(action.index + 1) % points.length] : points[action.index + 1];
      if (!a || !b) return state;
      const mid: Pt = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
      return insertPoint({ ...state, selected: action.index }, action.index + 1, mid);
    }
    case 'setSideLength': {
      if (!(action.lengthFt > 0)) return { ...state, refusal: { kind: 'zero-length' } };
      const moved = isRing(line)
        ? setRingSideLength(line, action.index, action.lengthFt)
        : setPathSideLength(line, action.index, action.lengthFt);
      return setPoints(state, state.active, moved);
    }
    case 'setSideAngle':
      return setPoints(
        state,
        state.active,
        setSideDirection(points, action.index, action.angleDeg, closed),
      );
    default:
      return null;
  }
}

function onDrag(state: EditorState, action: EditorAction): EditorState | null {
  switch (action.type) {
    case 'dragStart':
      return {
        ...state,
        active: action.line,
        selected: action.index,
        dragOrigin: state.doc,
        refusal: null,
      };
    case 'dragMove': {
      const line = lineOf(state.doc, state.active);
      if (!state.dragOrigin || !line || state.selected === null) return state;
      const neighbours = neighboursOf(line.points, state.selected, isClosed(state.active));
      const point = snapPoint({ ...action, neighbours, snapping: state.snapping });
      const points = moveRingPoint(line, state.selected, point).points;
      const refusal = lineRefusal(points, state.active);
      if (refusal) return { ...state, refusal };
      return {
        ...state,
        refusal: null,
        doc: withLine(state.doc, state.active, (l) => ({ ...l, points })),
      };
    }
    case 'dragEnd': {
      const origin = state.dragOrigin;
      if (!origin) return state;
      const moved = origin !== state.doc;
      return {
        ...state,
        dragOrigin: null,
        past: moved ? [...state.past, origin] : state.past,
        future: moved ? [] : state.future,
      };
    }
    default:
      return null;
  }
}

function onLines(state: EditorState, action: EditorAction): EditorState | null {
  const { doc } = state;
  switch (action.type) {
    case 'select':
      return keepSelectionValid({
        ...state,
        active: action.line,
        selected: action.index,
        refusal: null,
      });
    case 'selectStep': {
      const count = lineOf(doc, state.active)?.points.length ?? 0;
      if (count === 0) return state;
      const from = state.selected ?? (action.step === 1 ? -1 : 0);
      return { ...state, selected: (from + action.step + count) % count };
    }
    case 'setTag':
      return editRing(state, action.line, (ring) => setRingTag(ring, action.index, action.tag));
    case 'setCurved':
      return editRing(state, action.line, (ring) =>
        setRingCurved(ring, action.index, action.curved),
      );
    case 'setAllTags':
      return editRing(state, OUTER, (ring) => ({ ...ring, tags: ring.tags.map(() => action.tag) }));
    case 'template':
      return {
        ...commit(state, { ...doc, outer: outlineTemplate(action.template) }),
        active: OUTER,
        selected: null,
      };
    case 'addHole': {
      const hole =
        action.shape === 'empty'
          ? { ...emptyRing(), kind: action.kind }
          : placeHole(doc, action.kind);
      const next = commit(state, { ...doc, holes: [...doc.holes, hole] });
      return { ...next, active: { kind: 'hole', index: doc.holes.length }, selected: null };
    }
    case 'setHoleKind':
      return commit(state, {
        ...doc,
        holes: doc.holes.map((h, i) => (i === action.index ? { ...h, kind: action.kind } : h)),
      });
    case 'addPath': {
      const next = commit(state, {
        ...doc,
        paths: [...doc.paths, { points: [], widthFt: DEFAULT_WALKWAY_WIDTH_FT }],
      });
      return { ...next, active: { kind: 'path', index: doc.paths.length }, selected: null };
    }
    case 'setPathWidth':
      if (!(action.widthFt > 0)) return { ...state, refusal: { kind: 'zero-length' } };
      return commit(state, {
        ...doc,
        paths: doc.paths.map((p, i) =>
          i === action.index ? { ...p, widthFt: action.widthFt } : p,
        ),
      });
    case 'removeLine': {
      const { line } = action;
      const next =
        line.kind === 'outer'
          ? { ...doc, outer: emptyRing() }
          : line.kind === 'hole'
            ? { ...doc, holes: doc.holes.filter((_, i) => i !== line.index) }
            : { ...doc, paths: doc.paths.filter((_, i) => i !== line.index) };
      return { ...commit(state, next), active: OUTER, selected: null };
    }
    default:
      return null;
  }
}

/** The area editor's whole behaviour: a pure function of the state and one action. */
export function editorReducer(state: EditorState, action: EditorAction): EditorState {
  switch (action.type) {
    case 'undo':
      return undo(state);
    case 'redo':
      return redo(state);
    case 'setSnapping':
      return { ...state, snapping: action.snapping };
    case 'dismissRefusal':
      return { ...state, refusal: null };
    case 'load':
      return { ...initialEditorState(action.doc), snapping: state.snapping };
    default:
      return onDrag(state, action) ?? onLines(state, action) ?? onPoints(state, action) ?? state;
  }
}
