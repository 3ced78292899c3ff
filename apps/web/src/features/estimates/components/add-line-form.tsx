import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useBoundField } from '../../../components/ui/form/fields';
import { newLineOf, newLineSchema, type NewLineValues } from '../utils/line-edits';

function TaxableField() {
  const { registration } = useBoundField('taxable');
  return (
    <label className="flex min-h-11 items-center gap-2 font-semibold">
      <input type="checkbox" className="h-5 w-5" {...registration} />
      Taxed
    </label>
  );
}

const empty: NewLineValues = { label: '', quantity: '1', unit: '', unitPrice: '', taxable: true };

/** A line typed by hand (a delivery fee, a gate removal) added to one tier. */
export function AddLineForm({
  tierId,
  tierName,
  onAdd,
}: {
  tierId: string;
  tierName: string;
  onAdd: (line: ReturnType<typeof newLineOf>) => Promise<unknown>;
}) {
  return (
    <details className="rounded-lg border border-line bg-white p-4">
      <summary className="cursor-pointer font-semibold text-moss-800">Add a line by hand</summary>
      <Form
        schema={newLineSchema}
        defaultValues={empty}
        aria-label={`Add a line to ${tierName}`}
        className="mt-3"
        onSubmit={async (values, methods) => {
          await onAdd(newLineOf(values, tierId));
          methods.reset(empty);
        }}
      >
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <TextField name="label" label="Item" wrapperClassName="sm:col-span-2" />
          <TextField name="quantity" label="Quantity" inputMode="decimal" />
          <TextField name="unit" label="Unit" hint="job, sq ft, hours…" />
          <TextField name="unitPrice" label="Unit price" inputMode="decimal" />
          <TaxableField />
        </div>
        <div>
          <SubmitButton busyLabel="Adding…">Add line</SubmitButton>
        </div>
      </Form>
    </details>
  );
}
