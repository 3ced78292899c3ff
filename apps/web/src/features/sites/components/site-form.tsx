import { createSiteInputSchema, type CreateSiteData, type SiteView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextAreaField, TextField } from '../../../components/ui/form';

/** An empty number box means "not counted yet" (null), not zero. */
const toCount = (value: unknown) =>
  value === '' || value === null || value === undefined ? null : Number(value);

interface SiteFormProps {
  site?: SiteView;
  submitLabel: string;
  onSubmit: (values: CreateSiteData) => Promise<unknown>;
  onCancel: () => void;
}

export function SiteForm({ site, submitLabel, onSubmit, onCancel }: SiteFormProps) {
  return (
    <Form
      schema={createSiteInputSchema}
      defaultValues={{
        label: site?.label ?? '',
        addressLine1: site?.addressLine1 ?? '',
        addressLine2: site?.addressLine2 ?? '',
        city: site?.city ?? '',
        region: site?.region ?? '',
        postalCode: site?.postalCode ?? '',
        accessNotes: site?.accessNotes ?? '',
        pets: site?.pets ?? '',
        hazards: site?.hazards ?? '',
        sprinklerHeads: site?.sprinklerHeads ?? null,
      }}
      onSubmit={onSubmit}
      aria-label={submitLabel}
    >
      <TextField
        name="label"
        label="Name for this site (optional)"
        hint="For example: Back yard, Rental on Quarry Lane."
      />
      <TextField name="addressLine1" label="Street address" autoComplete="off" />
      <TextField name="addressLine2" label="Address line 2 (optional)" autoComplete="off" />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField name="city" label="Town or city" autoComplete="off" />
        <TextField name="region" label="State or region" autoComplete="off" />
        <TextField name="postalCode" label="Postal code" autoComplete="off" />
      </div>
      <TextAreaField
        name="accessNotes"
        label="Access and gate notes"
        hint="Gate codes, gate width for the roll, where to park the trailer."
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextAreaField name="pets" label="Pets" hint="Dogs in the yard, when they are kept in." />
        <TextAreaField
          name="hazards"
          label="Hazards"
          hint="Slopes, overhead lines, pools, known buried lines."
        />
      </div>
      <TextField
        name="sprinklerHeads"
        label="Sprinkler heads to cap (heads)"
        type="number"
        inputMode="numeric"
        min={0}
        max={500}
        step={1}
        className="max-w-40 tabular-nums"
        hint="Leave empty if nobody has counted yet."
        registerOptions={{ setValueAs: toCount }}
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton>{submitLabel}</SubmitButton>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
