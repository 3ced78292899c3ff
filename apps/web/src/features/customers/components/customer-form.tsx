import {
  createCustomerInputSchema,
  type CreateCustomerData,
  type CustomerView,
} from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextAreaField, TextField } from '../../../components/ui/form';

interface CustomerFormProps {
  customer?: CustomerView;
  submitLabel: string;
  onSubmit: (values: CreateCustomerData) => Promise<unknown>;
  onCancel?: () => void;
}

/**
 * Create or edit a customer. Checked against the same schema the API uses as you type; when
 * the server still says no, its messages land beside the fields and what was typed stays.
 */
export function CustomerForm({ customer, submitLabel, onSubmit, onCancel }: CustomerFormProps) {
  return (
    <Form
      schema={createCustomerInputSchema}
      defaultValues={{
        name: customer?.name ?? '',
        email: customer?.email ?? '',
        phone: customer?.phone ?? '',
        billingAddress: customer?.billingAddress ?? '',
        notes: customer?.notes ?? '',
      }}
      onSubmit={onSubmit}
      className="max-w-2xl"
      aria-label={submitLabel}
    >
      <TextField name="name" label="Name" autoComplete="off" />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="phone" label="Phone" type="tel" autoComplete="off" />
        <TextField name="email" label="E-mail" type="email" autoComplete="off" />
      </div>
      <TextAreaField
        name="billingAddress"
        label="Billing address"
        hint="As it should print on estimates and invoices."
      />
      <TextAreaField name="notes" label="Notes" />
      <div className="flex flex-wrap gap-2">
        <SubmitButton>{submitLabel}</SubmitButton>
        {onCancel ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </Form>
  );
}
