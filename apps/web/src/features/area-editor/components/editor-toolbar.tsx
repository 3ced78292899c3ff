import { useId, type Dispatch } from 'react';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import type { OutlineTemplate } from '../model/templates';
import type { EditorState } from '../model/types';

const templates: { template: OutlineTemplate; label: string }[] = [
  { template: 'rectangle', label: 'Rectangle' },
  { template: 'l-shape', label: 'L shape' },
  { template: 'circle', label: 'Circle' },
];

/** Grid steps offered for snapping, in feet (0.5 ft = 6 in; metric companies see metres). */
const gridSteps = [0.5, 1, 2, 5];

/** Start from a shape, undo and redo, and how points snap. */
export function EditorToolbar({
  state,
  dispatch,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
}) {
  const units = useUnits();
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
      <div
        role="group"
        aria-label="Start from a shape"
        className="flex flex-wrap items-center gap-2"
      >
        <span className="font-semibold" aria-hidden="true">
          Start from
        </span>
        {templates.map(({ template, label }) => (
          <Button
            key={template}
            variant="secondary"
            aria-label={`Start from a ${label.toLowerCase()}`}
            onClick={() => dispatch({ type: 'template', template })}
          >
            {label}
          </Button>
        ))}
      </div>
      <div role="group" aria-label="History" className="flex gap-2">
        <Button
          variant="secondary"
          disabled={state.past.length === 0}
          onClick={() => dispatch({ type: 'undo' })}
          aria-keyshortcuts="Control+Z"
        >
          Undo
        </Button>
        <Button
          variant="secondary"
          disabled={state.future.length === 0}
          onClick={() => dispatch({ type: 'redo' })}
          aria-keyshortcuts="Control+Shift+Z Control+Y"
        >
          Redo
        </Button>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-grid`} className="text-sm font-semibold">
            Snap to grid
          </label>
          <select
            id={`${id}-grid`}
            className="block min-h-11 rounded-md border border-line-strong bg-white px-2"
            value={state.snapping.gridFt ?? ''}
            onChange={(event) =>
              dispatch({
                type: 'setSnapping',
                snapping: {
                  ...state.snapping,
                  gridFt: event.target.value === '' ? null : Number(event.target.value),
                },
              })
            }
          >
            <option value="">Off</option>
            {gridSteps.map((step) => (
              <option key={step} value={step}>
                Every {units.length(step)}
              </option>
            ))}
          </select>
        </div>
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="checkbox"
            className="h-5 w-5"
            checked={state.snapping.angles}
            onChange={(event) =>
              dispatch({
                type: 'setSnapping',
                snapping: { ...state.snapping, angles: event.target.checked },
              })
            }
          />
          Square up to 90° and 45°
        </label>
      </div>
    </div>
  );
}
