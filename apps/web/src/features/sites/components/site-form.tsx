import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createSiteInputSchema, type CreateSiteData, type SiteView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';

const fields = [
  'label',
  'addressLine1',
  'addressLine2',
  'city',
  'region',
  'postalCode',
  'accessNotes',
  'pets',
  'hazards',
  'sprinklerHeads',
] as const;

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
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(createSiteInputSchema),
    mode: 'onChange',
    defaultValues: {
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
    },
  });
  const { errors } = formState;

  const { submit, formError } = useServerSubmit(
    { handleSubmit, setError },
    fields,
    async (values) => {
      await onSubmit(values);
    },
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label={submitLabel}>
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="Name for this site (optional)"
        hint="For example: Back yard, Rental on Quarry Lane."
        error={errors.label?.message}
        {...register('label')}
      />
      <TextField
        label="Street address"
        autoComplete="off"
        error={errors.addressLine1?.message}
        {...register('addressLine1')}
      />
      <TextField
        label="Address line 2 (optional)"
        autoComplete="off"
        error={errors.addressLine2?.message}
        {...register('addressLine2')}
      />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField
          label="Town or city"
          autoComplete="off"
          error={errors.city?.message}
          {...register('city')}
        />
        <TextField
          label="State or region"
          autoComplete="off"
          error={errors.region?.message}
          {...register('region')}
        />
        <TextField
          label="Postal code"
          autoComplete="off"
          error={errors.postalCode?.message}
          {...register('postalCode')}
        />
      </div>
      <TextAreaField
        label="Access and gate notes"
        hint="Gate codes, gate width for the roll, where to park the trailer."
        error={errors.accessNotes?.message}
        {...register('accessNotes')}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextAreaField
          label="Pets"
          hint="Dogs in the yard, when they are kept in."
          error={errors.pets?.message}
          {...register('pets')}
        />
        <TextAreaField
          label="Hazards"
          hint="Slopes, overhead lines, pools, known buried lines."
          error={errors.hazards?.message}
          {...register('hazards')}
        />
      </div>
      <TextField
        label="Sprinkler heads to cap (heads)"
        type="number"
        inputMode="numeric"
        min={0}
        max={500}
        step={1}
        className="max-w-40 tabular-nums"
        hint="Leave empty if nobody has counted yet."
        error={errors.sprinklerHeads?.message}
        {...register('sprinklerHeads', { setValueAs: toCount })}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isBusy={formState.isSubmitting}>
          {submitLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
