import { useEffect } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { SelectField } from '../../../components/ui/form';
import { useUnits } from '../../../lib/units';
import type { TurfProductChoice } from '../api/get-turf-products';
import { standardRollWidthsFt, type AreaFormValues } from '../utils/area-form-values';

/** The widths the roll-width box offers: the product's, or the common ones without a product. */
export function rollWidthsFor(
  products: readonly TurfProductChoice[],
  productId: string,
): readonly number[] {
  return products.find((product) => product.id === productId)?.rollWidthsFt ?? standardRollWidthsFt;
}

/** Turf product and roll width; choosing another product picks its first width. */
export function TurfFields({ products }: { products: readonly TurfProductChoice[] }) {
  const { length } = useUnits();
  const { setValue, getValues } = useFormContext<AreaFormValues>();
  const productId = useWatch<AreaFormValues, 'turfProductId'>({ name: 'turfProductId' });
  const widths = rollWidthsFor(products, productId);
  useEffect(() => {
    const current = Number(getValues('roll.widthFt'));
    if (!widths.includes(current))
      setValue('roll.widthFt', String(widths[0] ?? ''), { shouldValidate: true });
  }, [widths, getValues, setValue]);
  return (
    <>
      <SelectField
        name="turfProductId"
        label="Turf product"
        hint={
          products.length === 0
            ? 'Add turf to the price book in Settings to choose it here.'
            : undefined
        }
      >
        <option value="">No product yet</option>
        {products.map((product) => (
          <option key={product.id} value={product.id}>
            {product.name}
          </option>
        ))}
      </SelectField>
      <SelectField name="roll.widthFt" label="Roll width">
        {widths.map((width) => (
          <option key={width} value={String(width)}>
            {length(width)}
          </option>
        ))}
      </SelectField>
    </>
  );
}
