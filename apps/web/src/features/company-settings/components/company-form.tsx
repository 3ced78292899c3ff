import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { optionalText, requiredText, timeZoneSchema, type CompanyView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useUpdateCompany } from '../api/update-company';

// The shared update schema is all-optional (PATCH); this form always sends every field.
const companyFormSchema = z.object({
  name: requiredText('Company name', 120),
  timeZone: timeZoneSchema,
  region: optionalText(8),
  measurementSystem: z.enum(['imperial', 'metric']),
});
const fields = ['name', 'timeZone', 'region', 'measurementSystem'] as const;

function timeZones(current: string): string[] {
  const all =
    typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return all.includes(current) ? all : [current, ...all];
}

export function CompanyForm({
  company,
  onSaved,
}: {
  company: CompanyView;
  onSaved: () => Promise<void> | void;
}) {
  const [saved, setSaved] = useState(false);
  const update = useUpdateCompany(onSaved);
  const zones = useMemo(() => timeZones(company.timeZone), [company.timeZone]);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(companyFormSchema),
    mode: 'onChange',
    defaultValues: {
      name: company.name,
      timeZone: company.timeZone,
      region: company.region ?? '',
      measurementSystem: company.measurementSystem,
    },
  });
  const { errors } = formState;

  const { submit, formError } = useServerSubmit(
    { handleSubmit, setError },
    fields,
    async (values) => {
      setSaved(false);
      await update.mutateAsync(values);
      setSaved(true);
    },
  );

  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex max-w-xl flex-col gap-4"
      aria-label="Company details"
    >
      <FormAlert>{formError}</FormAlert>
      {saved ? <FormNotice>Company details saved.</FormNotice> : null}
      <TextField label="Company name" error={errors.name?.message} {...register('name')} />
      <SelectField
        label="Time zone"
        hint="Dates across Seamwright show in this time zone."
        error={errors.timeZone?.message}
        {...register('timeZone')}
      >
        {zones.map((zone) => (
          <option key={zone} value={zone}>
            {zone.replace(/_/g, ' ')}
          </option>
        ))}
      </SelectField>
      <TextField
        label="State or region code"
        hint="For example CO or ON. It decides public holidays and the utility-locate waiting period."
        className="max-w-40 uppercase"
        error={errors.region?.message}
        {...register('region')}
      />
      <SelectField
        label="Measurements"
        error={errors.measurementSystem?.message}
        {...register('measurementSystem')}
      >
        <option value="imperial">Feet and inches (sq ft, cu yd, lb)</option>
        <option value="metric">Metric (m, m², m³, kg)</option>
      </SelectField>
      <div>
        <Button type="submit" isBusy={formState.isSubmitting}>
          Save company details
        </Button>
      </div>
    </form>
  );
}
