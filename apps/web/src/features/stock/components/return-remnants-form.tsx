import { useMemo, useState } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Form, LengthField, SelectField, SubmitButton } from '../../../components/ui/form';
import { countOf } from '../../../lib/format';
import { useUnits } from '../../../lib/units';
import { useReturnRemnants } from '../api/return-remnants';
import type { UsedRoll } from '../utils/reservation-rolls';
import { inCompanyUnits } from '../utils/feet-words';
import { remnantsFormSchema } from '../utils/stock-forms';

const emptyRow = (rolls: UsedRoll[]) => ({
  rollId: rolls.length === 1 ? (rolls[0]?.rollId ?? '') : '',
  lengthFt: null,
});

function RemnantRows({ rolls }: { rolls: UsedRoll[] }) {
  const { control } = useFormContext<{ remnants: { rollId: string; lengthFt: number | null }[] }>();
  const { fields, append, remove } = useFieldArray({ control, name: 'remnants' });
  return (
    <>
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => (
          <li
            key={field.id}
            className="grid grid-cols-2 items-start gap-3 rounded-md border border-line bg-sand-50 p-3 sm:grid-cols-[14rem_16rem_auto] sm:justify-start"
          >
            <SelectField name={`remnants.${index}.rollId`} label={`Piece ${index + 1} cut from`}>
              {rolls.length === 1 ? null : <option value="">Choose the roll…</option>}
              {rolls.map((roll) => (
                <option key={roll.rollId} value={roll.rollId}>
                  {roll.isRemnant ? 'Remnant' : 'Roll'} {roll.number}, lot {roll.dyeLot}
                </option>
              ))}
            </SelectField>
            <LengthField
              name={`remnants.${index}.lengthFt`}
              label={`Piece ${index + 1} length`}
              hint=""
            />
            <Button
              variant="quietDanger"
              className="col-span-2 justify-self-end sm:col-span-1 sm:mt-7"
              disabled={fields.length === 1}
              onClick={() => remove(index)}
              aria-label={`Remove piece ${index + 1}`}
            >
              Remove
            </Button>
          </li>
        ))}
      </ol>
      <div>
        <Button variant="secondary" onClick={() => append(emptyRow(rolls))}>
          Add a piece
        </Button>
      </div>
    </>
  );
}

/**
 * What the crew brings back: each piece with the roll it was cut from and its length. They go
 * into stock as remnants of that roll's product and lot, at the roll's full width.
 */
export function ReturnRemnantsForm({ jobId, rolls }: { jobId: string; rolls: UsedRoll[] }) {
  const units = useUnits();
  const schema = useMemo(() => remnantsFormSchema(units), [units]);
  const returned = useReturnRemnants(jobId);
  const [done, setDone] = useState<string | null>(null);
  return (
    <Form
      schema={schema}
      aria-label="Return remnants"
      defaultValues={{ remnants: [emptyRow(rolls)] }}
      onSubmit={async (values, methods) => {
        setDone(null);
        const made = await returned
          .mutateAsync({
            remnants: values.remnants.map((r) => ({ rollId: r.rollId, lengthFt: r.lengthFt })),
          })
          .catch((error: unknown) => {
            throw inCompanyUnits(error, units);
          });
        setDone(`Back in stock: ${countOf(made.length, 'remnant')}.`);
        methods.reset({ remnants: [emptyRow(rolls)] });
      }}
    >
      <p className="text-ink-muted">
        Pieces left over go back into stock at the full width of the roll they came from.{' '}
        {units.lengthExamples}.
      </p>
      <RemnantRows rolls={rolls} />
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton busyLabel="Saving…">Return remnants</SubmitButton>
        {done ? (
          <p role="status" className="font-semibold text-moss-800">
            {done}
          </p>
        ) : null}
      </div>
    </Form>
  );
}
