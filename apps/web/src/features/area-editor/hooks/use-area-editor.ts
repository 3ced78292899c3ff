import { useReducer, type Dispatch } from 'react';
import type { EditorAction } from '../model/actions';
import { editorReducer, initialEditorState } from '../model/reducer';
import type { EditorDoc, EditorState } from '../model/types';

export interface AreaEditorHandle {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
}

/** The editor's state for a page that saves it: start from a saved drawing or empty. */
export function useAreaEditor(initialDoc?: EditorDoc): AreaEditorHandle {
  const [state, dispatch] = useReducer(editorReducer, initialDoc, (doc) => initialEditorState(doc));
  return { state, dispatch };
}
