import { useId, useState, type Dispatch } from 'react';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import { lineOf } from '../model/lines';
import type { EditorState } from '../model/types';
import { compassDirections, lineName } from '../model/words';

/**
 * Drawing by typing: each side is a direction and a length from the last point (or from the
 * selected one); the first side starts at the drawing's origin. The closing side of an outline
 * or hole is drawn by itself back to the first point.
 */
export function AddSideForm({
  state,
  dispatch,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
}) {
  const units = useUnits();
  const id = useId();
  const [angleDeg, setAngleDeg] = useState(0);
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const name = lineName(state.doc, state.active).toLowerCase();
  const count = lineOf(state.doc, state.active)?.points.length ?? 0;
  const from = count === 0 ? 'the start' : `point ${(state.selected ?? count - 1) + 1}`;
  return (
    <form
      aria-label={`Add a side to the ${name}`}
      className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-3"
      onSubmit={(event) => {
        event.preventDefault();
        const read = units.parseLength(text);
        if (!read.ok) {
          setError(read.error.message);
          return;
        }
        setError(null);
        setText('');
        dispatch({ type: 'appendSide', angleDeg, lengthFt: read.feet });
      }}
    >
      <p className="w-full font-semibold">
        Add a side to the {name}, from {from}
      </p>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-dir`} className="text-sm font-semibold">
          Direction
        </label>
        <select
          id={`${id}-dir`}
          className="block min-h-11 rounded-md border border-line-strong bg-white px-2"
          value={angleDeg}
          onChange={(event) => setAngleDeg(Number(event.target.value))}
        >
          {compassDirections.map((d) => (
            <option key={d.angleDeg} value={d.angleDeg}>
              {d.label}
            </option>
          ))}
        </select>
      </div>
      <div className="flex w-40 flex-col gap-1">
        <label htmlFor={`${id}-len`} className="text-sm font-semibold">
          Length ({units.lengthWord})
        </label>
        <input
          id={`${id}-len`}
          value={text}
          autoComplete="off"
          spellCheck={false}
          className="block min-h-11 w-full rounded-md border border-line-strong bg-white px-2 tabular-nums aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50"
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-len-note`}
          onChange={(event) => setText(event.target.value)}
        />
      </div>
      <Button type="submit" variant="secondary">
        Add side
      </Button>
      <p
        id={`${id}-len-note`}
        className={
          error ? 'w-full text-sm font-semibold text-brick-700' : 'w-full text-sm text-ink-muted'
        }
      >
        {error ?? `${units.lengthExamples}. Enter adds the side.`}
      </p>
    </form>
  );
}
