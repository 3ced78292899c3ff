import { useState } from 'react';
import { useUnits } from '../../lib/units';
import { AreaEditor } from '../../features/area-editor/components/area-editor';
import { useAreaEditor } from '../../features/area-editor/hooks/use-area-editor';
import { drawingProblems } from '../../features/area-editor/model/measure';
import { fromDrawingFields, toDrawingFields } from '../../features/area-editor/model/to-request';
import { problemMessage } from '../../features/area-editor/model/words';
import type { Area } from '../../features/areas/api/area-types';
import { useTurfProducts } from '../../features/areas/api/get-turf-products';
import { AreaForm } from '../../features/areas/components/area-form';
import { readSavedDrawing } from '../../features/areas/utils/saved-drawing';

/**
 * The area form page, shared by "new area" and "change area": the area editor (its own
 * feature) draws, the areas feature's form holds the details and saves both together.
 */
export function AreaEditorPage({
  jobId,
  area,
  onSaved,
  onCancel,
}: {
  jobId: string;
  area: Area | null;
  onSaved: (area: Area) => void;
  onCancel: () => void;
}) {
  const units = useUnits();
  const products = useTurfProducts();
  // The saved drawing opens once; later saves go to another page.
  const [initialDoc] = useState(() => {
    const saved = area ? readSavedDrawing(area.request) : null;
    return saved ? fromDrawingFields(saved) : undefined;
  });
  const { state, dispatch } = useAreaEditor(initialDoc);
  const [problem] = drawingProblems(state.doc);
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="area-drawing-heading" className="flex flex-col gap-3">
        <h2 id="area-drawing-heading" className="text-xl font-bold">
          Drawing
        </h2>
        <p className="text-ink-muted">
          Start from a shape or click the corners, then type each side’s length as you measured it.
          North is up.
        </p>
        <AreaEditor state={state} dispatch={dispatch} />
      </section>
      <section aria-labelledby="area-details-heading" className="flex flex-col gap-3">
        <h2 id="area-details-heading" className="text-xl font-bold">
          Details
        </h2>
        <div className="rounded-lg border border-line bg-white p-4 sm:p-6">
          <AreaForm
            jobId={jobId}
            area={area}
            products={products}
            drawingProblem={problem ? problemMessage(problem, state.doc, units) : null}
            getDrawing={() => toDrawingFields(state.doc)}
            onSaved={onSaved}
            onCancel={onCancel}
          />
        </div>
      </section>
    </div>
  );
}
