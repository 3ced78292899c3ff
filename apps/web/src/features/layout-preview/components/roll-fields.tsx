import { SelectField } from '../../../components/ui/form-fields';
import { useUnits } from '../../../lib/units';
import type { FieldErrors } from '../utils/shape-builders';
import {
  grainChoices,
  rollWidthsFt,
  usages,
  type GrainChoice,
  type LayoutParams,
  type Usage,
} from '../utils/layout-params';
import { ChoiceGroup } from './choice-group';
import { LengthField } from './length-field';

interface RollFieldsProps {
  params: LayoutParams;
  errors: FieldErrors;
  update: (change: Partial<LayoutParams>) => void;
}

const grainLabels: Record<GrainChoice, string> = {
  auto: 'Choose for me',
  'north-south': 'Runs north–south',
  'east-west': 'Runs east–west',
  angle: 'Another angle',
};

const usageLabels: Record<Usage, string> = {
  landscape: 'Landscape',
  pet: 'Pet area',
  play: 'Play area',
  putting: 'Putting green',
};

/** The roll (width, longest piece), the grain and what the turf is for. */
export function RollFields({ params, errors, update }: RollFieldsProps) {
  const units = useUnits();
  return (
    <div className="flex flex-col gap-4">
      <ChoiceGroup
        legend="Roll width"
        value={params.roll}
        options={rollWidthsFt.map((width) => ({ value: width, label: units.length(width) }))}
        onChange={(roll) => update({ roll })}
      />
      <LengthField
        label="Longest piece off the roll"
        hint={`A bare number is ${units.lengthWord}; longer runs are joined with butt seams`}
        value={params.max}
        error={errors.max}
        onValue={(max) => update({ max })}
      />
      <ChoiceGroup
        legend="Grain"
        value={params.grain}
        options={grainChoices.map((choice) => ({ value: choice, label: grainLabels[choice] }))}
        onChange={(grain) => update({ grain })}
      />
      {params.grain === 'angle' ? (
        <LengthField
          label="Grain angle (degrees)"
          hint="Counter-clockwise from east: 0 runs east, 90 runs north"
          inputMode="decimal"
          value={params.angle}
          error={errors.angle}
          onValue={(angle) => update({ angle })}
        />
      ) : null}
      <SelectField
        label="Used as"
        value={params.use}
        onChange={(event) =>
          update({ use: usages.find((u) => u === event.target.value) ?? 'landscape' })
        }
      >
        {usages.map((usage) => (
          <option key={usage} value={usage}>
            {usageLabels[usage]}
          </option>
        ))}
      </SelectField>
    </div>
  );
}
