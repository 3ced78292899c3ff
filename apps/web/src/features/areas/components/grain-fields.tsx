import { useId } from 'react';
import { useWatch } from 'react-hook-form';
import { compassSides, type CompassSide } from '@seamwright/shared';
import { SelectField, TextField } from '../../../components/ui/form';
import { useBoundField } from '../../../components/ui/form/fields';
import type { GrainMode } from '../utils/area-form-values';

export const compassWords: Record<CompassSide, string> = {
  N: 'North',
  NE: 'North-east',
  E: 'East',
  SE: 'South-east',
  S: 'South',
  SW: 'South-west',
  W: 'West',
  NW: 'North-west',
};

const modes: { value: GrainMode; label: string; hint: string }[] = [
  {
    value: 'cheapest',
    label: 'The way that buys the least turf',
    hint: 'The planner tries every direction and keeps the cheapest.',
  },
  {
    value: 'facing',
    label: 'Blades lean toward a side',
    hint: 'Lay the grain toward where people look from (the street or the house): it looks fuller.',
  },
  {
    value: 'angle',
    label: 'A direction I choose',
    hint: 'In degrees, as on the drawing.',
  },
];

/** How the grain is chosen: cheapest, facing a compass side, or a typed direction. */
export function GrainFields() {
  const { registration } = useBoundField('grain.kind');
  const kind = useWatch({ name: 'grain.kind' }) as GrainMode;
  const legendId = useId();
  return (
    <fieldset className="flex flex-col gap-3" aria-labelledby={legendId}>
      <legend id={legendId} className="text-lg font-bold">
        Grain
      </legend>
      <div className="flex flex-col gap-2">
        {modes.map((mode) => (
          <label
            key={mode.value}
            className="flex min-h-11 cursor-pointer items-start gap-3 rounded-md border border-line bg-white px-3 py-2 has-[:checked]:border-moss-700 has-[:checked]:bg-moss-50"
          >
            <input
              type="radio"
              value={mode.value}
              className="mt-1 h-5 w-5 shrink-0 accent-moss-700"
              {...registration}
            />
            <span>
              <span className="block font-semibold">{mode.label}</span>
              <span className="block text-sm text-ink-muted">{mode.hint}</span>
            </span>
          </label>
        ))}
      </div>
      {kind === 'facing' ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <SelectField name="grain.facing" label="Blades lean toward">
            {compassSides.map((side) => (
              <option key={side} value={side}>
                {compassWords[side]}
              </option>
            ))}
          </SelectField>
          <SelectField name="grain.toward" label="That side is">
            <option value="">Not said</option>
            <option value="street">The street</option>
            <option value="house">The house</option>
          </SelectField>
          <TextField
            name="grain.toleranceDeg"
            label="May turn up to (°)"
            hint="To save turf; empty keeps it exactly."
            inputMode="decimal"
            autoComplete="off"
          />
        </div>
      ) : null}
      {kind === 'angle' ? (
        <TextField
          name="grain.angleDeg"
          label="Grain direction (°)"
          hint="Counter-clockwise from east: 0° runs east, 90° north, 180° west, 270° south."
          inputMode="decimal"
          autoComplete="off"
          wrapperClassName="sm:max-w-xs"
        />
      ) : null}
    </fieldset>
  );
}
