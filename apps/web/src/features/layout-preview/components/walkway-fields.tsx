import { DEFAULT_WALKWAY_WIDTH_FT } from '@seamwright/takeoff';
import type { FieldErrors } from '../utils/shape-builders';
import type { LayoutParams } from '../utils/layout-params';
import { LengthField } from './length-field';

interface WalkwayFieldsProps {
  params: LayoutParams;
  errors: FieldErrors;
  update: (change: Partial<LayoutParams>) => void;
}

/** One optional walkway (two points), which the planner keeps seams out of where it costs no turf. */
export function WalkwayFields({ params, errors, update }: WalkwayFieldsProps) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-3">
      <legend className="font-semibold">Walkway (optional)</legend>
      <p className="text-sm text-ink-muted">
        Where people walk, {DEFAULT_WALKWAY_WIDTH_FT} ft wide; seams are kept out of it when that
        costs no extra turf. Give both ends as x, y in feet.
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
