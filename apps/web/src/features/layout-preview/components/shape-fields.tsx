import { beanYard } from '@seamwright/takeoff';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/form-fields';
import { useUnits } from '../../../lib/units';
import type { FieldErrors } from '../utils/shape-builders';
import { pointsToText } from '../utils/shape-builders';
import type { LayoutParams, ShapeKind } from '../utils/layout-params';
import { ChoiceGroup } from './choice-group';
import { LengthField } from './length-field';

interface ShapeFieldsProps {
  params: LayoutParams;
  errors: FieldErrors;
  update: (change: Partial<LayoutParams>) => void;
}

const shapeOptions: ReadonlyArray<{ value: ShapeKind; label: string }> = [
  { value: 'rectangle', label: 'Rectangle' },
  { value: 'l-shape', label: 'L-shape' },
  { value: 'points', label: 'Points' },
];

/** The yard's outline: a rectangle, an L, or points typed one per line. */
export function ShapeFields({ params, errors, update }: ShapeFieldsProps) {
  const units = useUnits();
  const isL = params.shape === 'l-shape';
  return (
    <div className="flex flex-col gap-4">
      <ChoiceGroup
        legend="Shape"
        value={params.shape}
        options={shapeOptions}
        onChange={(shape) => update({ shape })}
      />
      {params.shape === 'points' ? (
        <>
          <TextAreaField
            label={`Outline points (${units.lengthWord})`}
            hint="One x, y pair per line; x runs east, y runs north. A line reading hole starts a hole, such as a planter."
            value={params.pts}
            error={errors.pts}
            rows={8}
            spellCheck={false}
            className="font-mono text-sm tabular-nums"
            onChange={(event) => update({ pts: event.target.value })}
          />
          <Button
            variant="secondary"
            onClick={() => update({ pts: pointsToText(beanYard(), units) })}
          >
            Try a bean-shaped bed
          </Button>
        </>
      ) : (
        <div className="grid grid-cols-2 gap-3">
          <LengthField
            label={isL ? 'Overall length N–S' : 'Length (north–south)'}
            value={params.len}
            error={errors.len}
            onValue={(len) => update({ len })}
          />
          <LengthField
            label={isL ? 'Overall width E–W' : 'Width (east–west)'}
            value={params.wid}
            error={errors.wid}
            onValue={(wid) => update({ wid })}
          />
          {isL ? (
            <>
              <LengthField
                label="Notch length N–S"
                value={params.nlen}
                error={errors.nlen}
                onValue={(nlen) => update({ nlen })}
              />
              <LengthField
                label="Notch width E–W"
                value={params.nwid}
                error={errors.nwid}
                onValue={(nwid) => update({ nwid })}
              />
            </>
          ) : null}
          <p className="col-span-2 text-sm text-ink-muted">
            {units.lengthExamples}.
            {isL
              ? ' Lengths run north–south (N–S), widths east–west (E–W); the notch comes out of the north-east corner.'
              : ''}
          </p>
        </div>
      )}
    </div>
  );
}
