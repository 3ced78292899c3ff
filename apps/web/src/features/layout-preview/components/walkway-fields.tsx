import { DEFAULT_WALKWAY_WIDTH_FT } from '@seamwright/takeoff';
import type { FieldErrors } from '../utils/shape-builders';
import type { LayoutParams } from '../utils/layout-params';
import { useUnits } from '../../../lib/units';
import { LengthField } from './length-field';

interface WalkwayFieldsProps {
  params: LayoutParams;
  errors: FieldErrors;
  update: (change: Partial<LayoutParams>) => void;
}

/** One optional walkway (two points), which the planner keeps seams out of where it costs no turf. */
export function WalkwayFields({ params, errors, update }: WalkwayFieldsProps) {
  const units = useUnits();
  return (
    <fieldset className="flex min-w-0 flex-col gap-3">
      <legend className="font-semibold">Walkway (optional)</legend>
      <p className="text-sm text-ink-muted">
        Where people walk, {units.length(DEFAULT_WALKWAY_WIDTH_FT)} wide; seams are kept out of it
        when that costs no extra turf. Give both ends as x, y in {units.lengthWord}.
      </p>
      <div className="grid grid-cols-2 gap-3">
        <LengthField
          label="Starts at"
          placeholder="e.g. 0, 10"
          value={params.from}
          error={errors.from}
          onValue={(from) => update({ from })}
        />
        <LengthField
          label="Ends at"
          placeholder="e.g. 18, 10"
          value={params.to}
          error={errors.to}
          onValue={(to) => update({ to })}
        />
      </div>
    </fieldset>
  );
}
