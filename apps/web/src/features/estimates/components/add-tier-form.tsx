import { z } from 'zod';
import type { EstimateTier, UpdateEstimateInput } from '@seamwright/shared';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import type { TurfChoice } from '../api/get-turf-products';

const addTierSchema = z.object({
  name: z.string().trim().min(1, 'Give the option a name').max(80, 'At most 80 characters'),
  copyFromTierId: z.string(),
  turfProductId: z.string(),
});

/**
 * Another option for the customer: a copy of one option's lines, with the turf priced again
 * as another product when one is picked (e.g. a pet turf next to the landscape one).
 */
export function AddTierForm({
  tiers,
  turfProducts,
  onPatch,
}: {
  tiers: readonly EstimateTier[];
  turfProducts: readonly TurfChoice[];
  onPatch: (input: UpdateEstimateInput) => Promise<unknown>;
}) {
  const first = tiers[0];
  if (!first || tiers.length >= 5) return null;
  return (
    <details className="rounded-lg border border-line bg-white p-4 print:hidden">
      <summary className="cursor-pointer font-semibold text-moss-800">Offer another option</summary>
      <Form
        schema={addTierSchema}
        defaultValues={{ name: '', copyFromTierId: first.id, turfProductId: '' }}
        aria-label="Offer another option"
        className="mt-3"
        onSubmit={async (values, methods) => {
          await onPatch({
            tiers: {
              add: [
                {
                  name: values.name,
                  copyFromTierId: values.copyFromTierId,
                  ...(values.turfProductId ? { turfProductId: values.turfProductId } : {}),
                },
              ],
            },
          });
          methods.reset({ name: '', copyFromTierId: first.id, turfProductId: '' });
        }}
      >
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField name="name" label="Option name" hint="Such as Pet turf or Premium" />
          <SelectField name="copyFromTierId" label="Lines copied from">
            {tiers.map((tier) => (
              <option key={tier.id} value={tier.id}>
                {tier.name}
              </option>
            ))}
          </SelectField>
          <SelectField name="turfProductId" label="Turf">
            <option value="">Same turf as the copied option</option>
            {turfProducts.map((product) => (
              <option key={product.id} value={product.id}>
                {product.name}
              </option>
            ))}
          </SelectField>
        </div>
        <div>
          <SubmitButton busyLabel="Pricing…">Add option</SubmitButton>
        </div>
      </Form>
    </details>
  );
}
