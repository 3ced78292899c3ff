import { lineOf } from './lines';
import { OUTER, type EditorDoc, type EditorState } from './types';

/** Undo steps kept; older ones fall off (a day's drawing rarely needs more). */
export const HISTORY_LIMIT = 200;

/** A selection that still points at something after the drawing changed under it. */
export function keepSelectionValid(state: EditorState): EditorState {
  const line = lineOf(state.doc, state.active);
  if (!line) return { ...state, active: OUTER, selected: null };
  if (state.selected !== null && state.selected >= line.points.length)
    return { ...state, selected: line.points.length > 0 ? line.points.length - 1 : null };
  return state;
}

/** Makes `doc` the drawing as one undo step (nothing happens when it did not change). */
export function commit(state: EditorState, doc: EditorDoc): EditorState {
  if (doc === state.doc) return state;
  return {
    ...state,
    doc,
    past: [...state.past, state.doc].slice(-HISTORY_LIMIT),
    future: [],
    refusal: null,
  };
}

export function undo(state: EditorState): EditorState {
  const previous = state.past[state.past.length - 1];
  if (!previous) return state;
  return keepSelectionValid({
    ...state,
    doc: previous,
    past: state.past.slice(0, -1),
    future: [state.doc, ...state.future],
    refusal: null,
    dragOrigin: null,
  });
}

export function redo(state: EditorState): EditorState {
  const [next, ...rest] = state.future;
  if (!next) return state;
  return keepSelectionValid({
    ...state,
    doc: next,
    past: [...state.past, state.doc].slice(-HISTORY_LIMIT),
    future: rest,
    refusal: null,
    dragOrigin: null,
  });
}
