import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useUnits } from '../../lib/units';
import { AreaEditor } from '../../features/area-editor/components/area-editor';
import { useAreaEditor } from '../../features/area-editor/hooks/use-area-editor';
import { useUnderlay } from '../../features/area-editor/hooks/use-underlay';
import type { UnderlayControls } from '../../features/area-editor/hooks/use-underlay';
import { drawingProblems } from '../../features/area-editor/model/measure';
import { fromDrawingFields, toDrawingFields } from '../../features/area-editor/model/to-request';
import { problemMessage } from '../../features/area-editor/model/words';
import { areaKeys } from '../../features/areas/api/area-keys';
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
        {area ? (
          <SavedAreaEditor area={area} state={state} dispatch={dispatch} />
        ) : (
          <AreaEditor state={state} dispatch={dispatch} underlay={null} />
        )}
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

/** A saved area's editor also holds its photo or sketch (the upload needs the area's id). */
function SavedAreaEditor({
  area,
  ...editor
}: { area: Area } & Pick<Parameters<typeof AreaEditor>[0], 'state' | 'dispatch'>) {
  const queryClient = useQueryClient();
  const underlay: UnderlayControls = useUnderlay(area.id, area.underlay, () => {
    void queryClient.invalidateQueries({ queryKey: areaKeys.detail(area.id) });
  });
  return <AreaEditor {...editor} underlay={underlay} />;
}
