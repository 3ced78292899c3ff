import { useState } from 'react';
import { createJobInputSchema, type SiteView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import { SelectField as SelectControl } from '../../../components/ui/form-fields';
import { Loading } from '../../../components/ui/loading';
import { SearchBox } from '../../../components/ui/search-box';
import { useCreateJob } from '../api/create-job';
import { useChosenCustomer, useCustomerChoices, useSiteChoices } from '../api/get-job-choices';

function siteName(site: SiteView): string {
  const address = `${site.addressLine1}, ${site.city}`;
  return site.label ? `${site.label} — ${address}` : address;
}

interface NewJobFormProps {
  /** Set when the form was opened from a customer's page. */
  initialCustomerId?: string;
  onCreated: (id: string) => void;
  onCancel: () => void;
}

/** "New job": choose the customer, then one of their sites, and give the job a title. */
export function NewJobForm({ initialCustomerId = '', onCreated, onCancel }: NewJobFormProps) {
  const [q, setQ] = useState('');
  const [customerId, setCustomerId] = useState(initialCustomerId);
  const choices = useCustomerChoices(q);
  const chosen = useChosenCustomer(initialCustomerId);
  const customers = [...(choices.data?.data ?? [])];
  const start = chosen.data?.data;
  if (start && !customers.some((c) => c.id === start.id)) customers.unshift(start);

  return (
    <div className="flex max-w-2xl flex-col gap-4">
      <div className="flex flex-wrap items-end gap-4">
        <SearchBox
          label="Find a customer"
          value={q}
          onSearch={setQ}
          placeholder="Name, e-mail or phone"
        />
        <SelectControl
          label="Customer"
          value={customerId}
          onChange={(event) => setCustomerId(event.target.value)}
          wrapperClassName="min-w-60 flex-1"
        >
          <option value="">Choose a customer</option>
          {customers.map((customer) => (
            <option key={customer.id} value={customer.id}>
              {customer.name}
            </option>
          ))}
        </SelectControl>
      </div>
      {customerId ? (
        <JobDetailsForm
          key={customerId}
          customerId={customerId}
          onCreated={onCreated}
          onCancel={onCancel}
        />
      ) : (
        <div>
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      )}
    </div>
  );
}

/** The site and title for one chosen customer; started afresh when the customer changes. */
function JobDetailsForm({
  customerId,
  onCreated,
  onCancel,
}: {
  customerId: string;
  onCreated: (id: string) => void;
  onCancel: () => void;
}) {
  const sites = useSiteChoices(customerId);
  const create = useCreateJob();
  if (sites.isPending) return <Loading label="Loading the customer's sites…" />;
  const list = sites.data?.data ?? [];
  if (list.length === 0)
    return (
      <p className="text-ink-muted">
        This customer has no site yet. Add the site where the turf goes on their page first.
      </p>
    );
  return (
    <Form
      schema={createJobInputSchema}
      defaultValues={{ customerId, siteId: list.length === 1 ? list[0]?.id : '', title: '' }}
      onSubmit={async (values) => {
        const job = await create.mutateAsync(values);
        onCreated(job.id);
      }}
      aria-label="New job"
    >
      <SelectField name="siteId" label="Site">
        <option value="">Choose a site</option>
        {list.map((site) => (
          <option key={site.id} value={site.id}>
            {siteName(site)}
          </option>
        ))}
      </SelectField>
      <TextField
        name="title"
        label="Title"
        hint="What the work is, as you would say it on the phone: “Back lawn and dog run”."
        autoComplete="off"
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton>Save job</SubmitButton>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
