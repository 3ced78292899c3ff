import type { Dispatch } from 'react';
import type { EdgeTag } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import type { EditorAction } from '../model/actions';
import { measure } from '../model/measure';
import type { EditorState } from '../model/types';
import { tagLabels, tagOrder } from '../model/words';
import { tagStroke } from './canvas-layers';

/** Area and perimeter as they stand, announced politely as they change. */
export function MeasureSummary({ state, id }: { state: EditorState; id: string }) {
  const units = useUnits();
  const m = measure(state.doc);
  return (
    <dl
      id={id}
      aria-live="polite"
      className="grid grid-cols-2 gap-3 rounded-lg border border-line bg-sand-100 p-3 sm:grid-cols-4"
    >
      <div>
        <dt className="text-sm font-semibold">Area</dt>
        <dd className="text-lg tabular-nums" data-testid="editor-area">
          {units.area(m.areaSqFt)}
        </dd>
      </div>
      <div>
        <dt className="text-sm font-semibold">Perimeter</dt>
        <dd className="text-lg tabular-nums">{units.length(m.perimeterFt)}</dd>
      </div>
      <div>
        <dt className="text-sm font-semibold">Tight curves</dt>
        <dd className="text-lg tabular-nums">{units.length(m.curvedFt)}</dd>
      </div>
      <div>
        <dt className="text-sm font-semibold">Holes · walkways</dt>
        <dd className="text-lg tabular-nums">
          {state.doc.holes.length} · {state.doc.paths.length}
        </dd>
      </div>
    </dl>
  );
}

/** What the side colours mean, and one choice for every side of the outline at once. */
export function TagLegend({ dispatch }: { dispatch: Dispatch<EditorAction> }) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Side colours">
        {(['none', ...tagOrder] as const).map((tag) => (
          <li key={tag} className="flex items-center gap-1">
            <svg width="28" height="8" aria-hidden="true">
              <line
                x1="0"
                y1="4"
                x2="28"
                y2="4"
                stroke={tagStroke[tag].color}
                strokeWidth="3"
                strokeDasharray={tagStroke[tag].dash}
              />
            </svg>
            {tag === 'none' ? 'Not sure' : tagLabels[tag]}
          </li>
        ))}
        <li>Thick side: tight curve</li>
      </ul>
      <label className="flex items-center gap-2">
        <span className="font-semibold">Every outline side meets</span>
        <select
          className="block min-h-11 rounded-md border border-line-strong bg-white px-2"
          value="choose"
          onChange={(event) => {
            const value = event.target.value;
            if (value === 'choose') return;
            dispatch({ type: 'setAllTags', tag: value === '' ? null : (value as EdgeTag) });
          }}
        >
          <option value="choose">Choose…</option>
          <option value="">Not sure</option>
          {tagOrder.map((tag) => (
            <option key={tag} value={tag}>
              {tagLabels[tag]}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
