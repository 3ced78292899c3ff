import { useId, useState, type Dispatch, type KeyboardEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import { drawingProblems } from '../model/measure';
import type { EditorState } from '../model/types';
import { problemMessage, refusalMessage } from '../model/words';
import { AddSideForm } from './add-side-form';
import { EditorCanvas } from './editor-canvas';
import { EditorToolbar } from './editor-toolbar';
import { LinesPanel } from './lines-panel';
import { MeasureSummary, TagLegend } from './measure-summary';
import { PointsTable } from './points-table';
import { Shortcuts } from './shortcuts';
import { UnderlayPanel } from './underlay-panel';
import type { UnderlayControls } from '../hooks/use-underlay';

/** Typing in a box keeps the browser's own undo; everywhere else Ctrl+Z undoes the drawing. */
function isTextBox(target: EventTarget): boolean {
  return (
    target instanceof HTMLElement &&
    (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.isContentEditable)
  );
}

/**
 * The area editor: shape templates and snapping, the drawing, live area and perimeter, the
 * line being edited with its points list, typed sides, and the keys. State lives in the
 * caller's `useAreaEditor`, so the page can save it.
 */
export function AreaEditor({
  state,
  dispatch: send,
  underlay,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
  /** The photo under the drawing; null for an area not saved yet, absent for no panel. */
  underlay?: UnderlayControls | null;
}) {
  const units = useUnits();
  const summaryId = useId();
  const shortcutsId = useId();
  const [fitSignal, setFitSignal] = useState(0);
  const dispatch: Dispatch<EditorAction> = (action) => {
    send(action);
    // A typed side may run out of the view (it is drawn without looking), so the view follows.
    if (action.type === 'template' || action.type === 'load' || action.type === 'appendSide')
      setFitSignal((n) => n + 1);
  };
  const problems = drawingProblems(state.doc);
  const outline = state.doc.outer.points;
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (!(event.ctrlKey || event.metaKey) || isTextBox(event.target)) return;
    const key = event.key.toLowerCase();
    if (key === 'z' || key === 'y') {
      event.preventDefault();
      dispatch({ type: key === 'y' || event.shiftKey ? 'redo' : 'undo' });
    }
  };
  return (
    <div className="flex flex-col gap-4" onKeyDown={onKeyDown}>
      <EditorToolbar state={state} dispatch={dispatch} />
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="flex min-w-0 flex-col gap-3">
          <EditorCanvas
            state={state}
            dispatch={dispatch}
            fitSignal={fitSignal}
            describedBy={`${summaryId} ${shortcutsId}`}
            underlay={underlay?.drawing(outline) ?? null}
            onPick={underlay?.picking ? (point) => underlay.pick(point, outline) : null}
          />
          <TagLegend dispatch={dispatch} />
          <MeasureSummary state={state} id={summaryId} />
          {state.refusal ? (
            <div
              role="alert"
              className="flex flex-wrap items-center justify-between gap-2 rounded-md border border-brick-700 bg-brick-50 px-4 py-2 font-semibold text-brick-700"
            >
              <span>{refusalMessage(state.refusal, state.doc, units)}</span>
              <Button variant="quiet" onClick={() => dispatch({ type: 'dismissRefusal' })}>
                OK
              </Button>
            </div>
          ) : null}
          {problems.length > 0 ? (
            <ul
              aria-label="Still to fix before saving"
              className="list-disc rounded-md border border-caution-500 bg-caution-50 py-2 pr-3 pl-8 text-caution-800"
            >
              {problems.map((problem, i) => (
                <li key={i}>{problemMessage(problem, state.doc, units)}</li>
              ))}
            </ul>
          ) : null}
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          <LinesPanel state={state} dispatch={dispatch} />
          <AddSideForm state={state} dispatch={dispatch} />
          {underlay !== undefined ? <UnderlayPanel controls={underlay} /> : null}
          <Shortcuts id={shortcutsId} />
        </div>
      </div>
      <PointsTable state={state} dispatch={dispatch} />
    </div>
  );
}
