import { useEffect } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { LengthField, SelectField } from '../../../components/ui/form';
import { useUnits } from '../../../lib/units';
import type { TurfProduct } from '../api/get-turf-products';
import { RollCautions } from './roll-cautions';

/** The most rolls one delivery may list (the API's limit). */
const maxRolls = 50;

interface RowValues {
  widthFt: string | number;
  lengthFt: number | null;
}

/**
 * The delivery's rolls, one row each: width from the product's roll widths, length as typed.
 * Server errors such as `rolls.1.widthFt` land on that row's field by name.
 */
export function DeliveryRolls({ products }: { products: TurfProduct[] }) {
  const units = useUnits();
  const { control, getValues, setValue } = useFormContext<{
    turfProductId: string;
    rolls: RowValues[];
  }>();
  const { fields, append, remove } = useFieldArray({ control, name: 'rolls' });
  const productId = useWatch({ control, name: 'turfProductId' });
  const rows = useWatch({ control, name: 'rolls' });
  const widths = products.find((p) => p.id === productId)?.rollWidthsFt ?? [];

  // Another product may not come in the width a row holds: move those rows to its first width.
  // This keeps two form values in step, no fetching.
  useEffect(() => {
    const [firstWidth] = widths;
    if (firstWidth === undefined) return;
    getValues('rolls').forEach((row, i) => {
      if (!widths.includes(Number(row.widthFt)))
        setValue(`rolls.${i}.widthFt`, String(firstWidth), { shouldValidate: true });
    });
    // `widths` is a new array each render; the product id says when it really changed.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [productId, getValues, setValue]);

  const typed = rows.flatMap((row) =>
    typeof row.lengthFt === 'number'
      ? [{ widthFt: Number(row.widthFt), lengthFt: row.lengthFt }]
      : [],
  );
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="text-lg font-semibold">Rolls in this delivery</legend>
      <p className="text-sm text-ink-muted">
        Each roll&apos;s length as on its label. {units.lengthExamples}.
      </p>
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => (
          <li
            key={field.id}
            className="grid grid-cols-2 items-start gap-3 rounded-md border border-line bg-sand-50 p-3 sm:grid-cols-[10rem_16rem_auto] sm:justify-start"
          >
            <SelectField name={`rolls.${index}.widthFt`} label={`Roll ${index + 1} width`}>
              {widths.length === 0 ? <option value="">Choose the product first</option> : null}
              {widths.map((width) => (
                <option key={width} value={String(width)}>
                  {units.length(width)}
                </option>
              ))}
            </SelectField>
            <LengthField
              name={`rolls.${index}.lengthFt`}
              label={`Roll ${index + 1} length`}
              hint=""
            />
            <Button
              variant="quietDanger"
              className="col-span-2 justify-self-end sm:col-span-1 sm:mt-7"
              onClick={() => remove(index)}
              disabled={fields.length === 1}
              aria-label={`Remove roll ${index + 1}`}
            >
              Remove
            </Button>
          </li>
        ))}
      </ol>
      <div>
        <Button
          variant="secondary"
          disabled={fields.length >= maxRolls}
          onClick={() => {
            const last = getValues('rolls').at(-1);
            append({ widthFt: last?.widthFt ?? String(widths[0] ?? ''), lengthFt: null });
          }}
        >
          Add a roll
        </Button>
      </div>
      <RollCautions rolls={typed} />
    </fieldset>
  );
}
