import { useId, type Dispatch } from 'react';
import { Button } from '../../../components/ui/button';
import type { EditorAction } from '../model/actions';
import { sameLine, type EditorState, type HoleKind, type LineRef } from '../model/types';
import { holeKindLabels, lineName } from '../model/words';
import { LengthInput } from './length-input';

/**
 * The lines of the drawing (outline, holes, walkways), which one is being edited, and the
 * buttons that add holes and walkways. New points and the points list follow the chosen line.
 */
export function LinesPanel({
  state,
  dispatch,
}: {
  state: EditorState;
  dispatch: Dispatch<EditorAction>;
}) {
  const id = useId();
  const { doc } = state;
  const lines: LineRef[] = [
    { kind: 'outer' },
    ...doc.holes.map((_, index) => ({ kind: 'hole', index }) as const),
    ...doc.paths.map((_, index) => ({ kind: 'path', index }) as const),
  ];
  return (
    <div className="flex flex-col gap-3">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 font-semibold">Editing</legend>
        {lines.map((line) => {
          const key = `${line.kind}-${'index' in line ? line.index : 0}`;
          const count = (
            line.kind === 'outer'
              ? doc.outer
              : line.kind === 'hole'
                ? doc.holes[line.index]
                : doc.paths[line.index]
          )?.points.length;
          return (
            <div key={key} className="flex flex-wrap items-center gap-2">
              <label className="flex min-h-11 grow items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-line`}
                  className="h-5 w-5"
                  checked={sameLine(line, state.active)}
                  onChange={() => dispatch({ type: 'select', line, index: null })}
                />
                {lineName(doc, line)} <span className="text-ink-muted">({count ?? 0} points)</span>
              </label>
              {line.kind === 'hole' ? (
                <HoleKindSelect
                  value={doc.holes[line.index]?.kind ?? 'other'}
                  label={`${lineName(doc, line)} is a`}
                  onChange={(kind) => dispatch({ type: 'setHoleKind', index: line.index, kind })}
                />
              ) : null}
              {line.kind === 'path' ? (
                <LengthInput
                  label={`${lineName(doc, line)} width`}
                  feet={doc.paths[line.index]?.widthFt ?? null}
                  onCommit={(widthFt) =>
                    dispatch({ type: 'setPathWidth', index: line.index, widthFt })
                  }
                  className="w-28"
                />
              ) : null}
              {line.kind !== 'outer' ? (
                <Button
                  variant="quietDanger"
                  className="px-2"
                  onClick={() => dispatch({ type: 'removeLine', line })}
                  aria-label={`Remove ${lineName(doc, line).toLowerCase()}`}
                >
                  Remove
                </Button>
              ) : null}
            </div>
          );
        })}
      </fieldset>
      <div role="group" aria-label="Add to the drawing" className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          onClick={() => dispatch({ type: 'addHole', kind: 'planter', shape: 'template' })}
        >
          Add a planter
        </Button>
        <Button
          variant="secondary"
          onClick={() => dispatch({ type: 'addHole', kind: 'tree', shape: 'template' })}
        >
          Add a tree ring
        </Button>
        <Button
          variant="secondary"
          onClick={() => dispatch({ type: 'addHole', kind: 'other', shape: 'empty' })}
        >
          Draw a hole
        </Button>
        <Button variant="secondary" onClick={() => dispatch({ type: 'addPath' })}>
          Draw a walkway
        </Button>
      </div>
    </div>
  );
}

function HoleKindSelect({
  value,
  label,
  onChange,
}: {
  value: HoleKind;
  label: string;
  onChange: (kind: HoleKind) => void;
}) {
  return (
    <select
      aria-label={label}
      className="block min-h-11 rounded-md border border-line-strong bg-white px-2"
      value={value}
      onChange={(event) => onChange(event.target.value as HoleKind)}
    >
      {(Object.keys(holeKindLabels) as HoleKind[]).map((kind) => (
        <option key={kind} value={kind}>
          {holeKindLabels[kind]}
        </option>
      ))}
    </select>
  );
}
