import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  createCustomerInputSchema,
  type CreateCustomerData,
  type CustomerView,
} from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';

const fields = ['name', 'email', 'phone', 'billingAddress', 'notes'] as const;

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
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(createCustomerInputSchema),
    mode: 'onChange',
    defaultValues: {
      name: customer?.name ?? '',
      email: customer?.email ?? '',
      phone: customer?.phone ?? '',
      billingAddress: customer?.billingAddress ?? '',
      notes: customer?.notes ?? '',
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
    <form
      onSubmit={submit}
      noValidate
      className="flex max-w-2xl flex-col gap-4"
      aria-label={submitLabel}
    >
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="Name"
        autoComplete="off"
        error={errors.name?.message}
        {...register('name')}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Phone"
          type="tel"
          autoComplete="off"
          error={errors.phone?.message}
          {...register('phone')}
        />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          error={errors.email?.message}
          {...register('email')}
        />
      </div>
      <TextAreaField
        label="Billing address"
        hint="As it should print on estimates and invoices."
        error={errors.billingAddress?.message}
        {...register('billingAddress')}
      />
      <TextAreaField label="Notes" error={errors.notes?.message} {...register('notes')} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isBusy={formState.isSubmitting}>
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
