import { areaUsageLabels, areaUsages, ErrorCode } from '@seamwright/shared';
import type { EdgeTag } from '@seamwright/takeoff';
import { Button } from '../../../components/ui/button';
import {
  Form,
  LengthField,
  SelectField,
  SubmitButton,
  TextField,
} from '../../../components/ui/form';
import { ApiError } from '../../../lib/api-error';
import { useUnits } from '../../../lib/units';
import type { Area } from '../api/area-types';
import { useCreateArea } from '../api/create-area';
import type { TurfProductChoice } from '../api/get-turf-products';
import { useUpdateArea } from '../api/update-area';
import { areaFormDefaults, areaFormSchema, areaSettingsOf } from '../utils/area-form-values';
import { GrainFields } from './grain-fields';
import { TurfFields } from './turf-fields';

type Point = [number, number];

/** The drawing as the planner's request fields (the area editor's `toDrawingFields`). */
export interface PlannerDrawing {
  area: { outer: Point[]; holes: Point[][] };
  edges?: (EdgeTag | null)[];
  holeEdges?: (EdgeTag | null)[][];
  trafficPaths?: { points: Point[]; widthFt: number }[];
}

interface AreaFormProps {
  jobId: string;
  /** The area being changed, or null for a new one. */
  area: Area | null;
  products: readonly TurfProductChoice[];
  /** Why the drawing cannot be saved yet (the editor lists it too), or null. */
  drawingProblem: string | null;
  /** The drawing as it stands when Save is pressed. */
  getDrawing: () => PlannerDrawing;
  onSaved: (area: Area) => void;
  onCancel: () => void;
}

/**
 * The area's details and grain, saved together with the drawing from the editor above it.
 * The editor has forms of its own, so it sits beside this form rather than inside it. The
 * server plans the area; its 4xx answers land beside the field they name or in the alert.
 */
export function AreaForm({
  jobId,
  area,
  products,
  drawingProblem,
  getDrawing,
  onSaved,
  onCancel,
}: AreaFormProps) {
  const units = useUnits();
  const create = useCreateArea(jobId);
  const update = useUpdateArea(area?.id ?? '');
  const defaults = areaFormDefaults(
    area
      ? {
          ...area,
          rollWidthFt: area.plan.pieces[0]?.widthFt ?? area.turfProduct?.rollWidthsFt[0] ?? 15,
        }
      : null,
    products[0] ?? null,
  );
  return (
    <Form
      schema={areaFormSchema}
      defaultValues={defaults}
      aria-label={area ? `Change ${area.name}` : 'New area'}
      onSubmit={async (values) => {
        if (drawingProblem)
          // Shown in the form's alert like a server refusal, so the message sits by Save.
          throw new ApiError({
            status: 400,
            code: ErrorCode.ValidationFailed,
            title: drawingProblem,
            detail: `The drawing is not finished: ${drawingProblem}`,
          });
        const body = { ...areaSettingsOf(values), ...getDrawing() };
        onSaved(area ? await update.mutateAsync(body) : await create.mutateAsync(body));
      }}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          name="name"
          label="Area name"
          hint="As the crew calls it: “Back lawn”, “Dog run”."
          autoComplete="off"
        />
        <SelectField name="usage" label="Used for">
          {areaUsages.map((usage) => (
            <option key={usage} value={usage}>
              {areaUsageLabels[usage]}
            </option>
          ))}
        </SelectField>
        <TurfFields products={products} />
        <LengthField
          name="baseDepthFt"
          label="Base depth"
          hint={
            units.system === 'metric'
              ? 'Compacted base under the turf, such as 8 cm; empty uses your company’s standard.'
              : 'Compacted base under the turf, such as 3" or 3 in; empty uses your company’s standard.'
          }
        />
      </div>
      <GrainFields />
      <div className="flex flex-wrap gap-2">
        <SubmitButton busyLabel="Planning and saving…">
          {area ? 'Save changes' : 'Save area'}
        </SubmitButton>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
