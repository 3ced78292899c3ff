import { useMemo, useState } from 'react';
import { companyDetailsSchema } from '@seamwright/shared';
import {
  Form,
  SelectField,
  SubmitButton,
  TextAreaField,
  TextField,
} from '../../../components/ui/form';
import { FormNotice } from '../../../components/ui/form-alert';
import { useCompanySettings } from '../api/get-company';
import { useUpdateCompany } from '../api/update-company';

function timeZones(current: string): string[] {
  const all =
    typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return all.includes(current) ? all : [current, ...all];
}

/** The company's name, address, time zone, region and measurements (owner only). */
export function CompanyForm({ onSaved }: { onSaved: () => Promise<void> | void }) {
  const company = useCompanySettings();
  const [saved, setSaved] = useState(false);
  const update = useUpdateCompany(onSaved);
  const zones = useMemo(() => timeZones(company.timeZone), [company.timeZone]);
  return (
    <Form
      schema={companyDetailsSchema}
      defaultValues={{
        name: company.name,
        address: company.address ?? '',
        timeZone: company.timeZone,
        region: company.region ?? '',
        measurementSystem: company.measurementSystem,
      }}
      onSubmit={async (values) => {
        setSaved(false);
        await update.mutateAsync(values);
        setSaved(true);
      }}
      className="max-w-xl"
      aria-label="Company details"
    >
      {saved ? <FormNotice>Company details saved.</FormNotice> : null}
      <TextField name="name" label="Company name" autoComplete="organization" />
      <TextAreaField
        name="address"
        label="Address"
        hint="Street, town, state and postal code, as it should print on estimates and invoices."
        autoComplete="street-address"
        rows={4}
      />
      <SelectField
        name="timeZone"
        label="Time zone"
        hint="Dates across Seamwright show in this time zone."
      >
        {zones.map((zone) => (
          <option key={zone} value={zone}>
            {zone.replace(/_/g, ' ')}
          </option>
        ))}
      </SelectField>
      <TextField
        name="region"
        label="State or region code"
        hint="For example CO or ON. It decides public holidays and the utility-locate waiting period."
        className="max-w-40 uppercase"
      />
      <SelectField
        name="measurementSystem"
        label="Measurements"
        hint="How lengths and areas are typed and shown: feet and inches, or metres."
      >
        <option value="imperial">Feet and inches (sq ft, cu yd, lb)</option>
        <option value="metric">Metric (m, m², m³, kg)</option>
      </SelectField>
      <div>
        <SubmitButton>Save company details</SubmitButton>
      </div>
    </Form>
  );
}
