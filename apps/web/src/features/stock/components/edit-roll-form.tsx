import { useMemo } from 'react';
import type { RollView, UpdateRollInput } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import {
  Form,
  LengthField,
  SubmitButton,
  TextAreaField,
  TextField,
} from '../../../components/ui/form';
import { useUnits } from '../../../lib/units';
import { useUpdateRoll } from '../api/update-roll';
import { inCompanyUnits } from '../utils/feet-words';
import { rollFormSchema } from '../utils/stock-forms';
import { CheckboxField } from './checkbox-field';

interface EditRollFormProps {
  roll: RollView;
  onSaved: (roll: RollView) => void;
  onCancel: () => void;
}

/**
 * Corrects a roll: lot, place, a recount of the length left, notes, archived. Only what changed
 * is sent, so an untouched length never meets the "held by jobs" check; the server's 409 for a
 * length below what jobs hold (or archiving a held roll) shows under that field.
 */
export function EditRollForm({ roll, onSaved, onCancel }: EditRollFormProps) {
  const units = useUnits();
  const update = useUpdateRoll(roll.id);
  const schema = useMemo(() => rollFormSchema(units), [units]);
  return (
    <Form
      schema={schema}
      aria-label="Edit the roll"
      defaultValues={{
        dyeLot: roll.dyeLot,
        location: roll.location ?? '',
        remainingFt: roll.remainingFt,
        notes: roll.notes ?? '',
        archived: roll.archived,
      }}
      onSubmit={async (values) => {
        const change: UpdateRollInput = {};
        if (values.dyeLot !== roll.dyeLot) change.dyeLot = values.dyeLot;
        if (values.location !== roll.location) change.location = values.location;
        if (Math.abs(values.remainingFt - roll.remainingFt) > 1e-6)
          change.remainingFt = values.remainingFt;
        if (values.notes !== roll.notes) change.notes = values.notes;
        if (values.archived !== roll.archived) change.archived = values.archived;
        if (Object.keys(change).length === 0) return onSaved(roll);
        try {
          onSaved(await update.mutateAsync(change));
        } catch (error) {
          throw inCompanyUnits(error, units);
        }
      }}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="dyeLot" label="Dye lot" autoComplete="off" />
        <TextField
          name="location"
          label="Location (optional)"
          hint="Where the roll is kept, such as Yard rack B."
          autoComplete="off"
        />
      </div>
      <LengthField
        name="remainingFt"
        label="Length left"
        hint={
          roll.heldFt > 0
            ? `Jobs hold ${units.length(roll.heldFt)} of it, so it cannot be set below that.`
            : undefined
        }
        wrapperClassName="sm:max-w-xs"
      />
      <TextAreaField name="notes" label="Notes (optional)" />
      <CheckboxField
        name="archived"
        label="Archived"
        hint="An archived roll is hidden from the list and never reserved."
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton busyLabel="Saving…">Save roll</SubmitButton>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
