import { useCreateCustomer } from '../api/create-customer';
import { CustomerForm } from './customer-form';

/** The "New customer" form; tells the caller where the new customer lives. */
export function NewCustomer({
  onCreated,
  onCancel,
}: {
  onCreated: (id: string) => void;
  onCancel: () => void;
}) {
  const create = useCreateCustomer();
  return (
    <CustomerForm
      submitLabel="Save customer"
      onCancel={onCancel}
      onSubmit={async (values) => {
        const customer = await create.mutateAsync(values);
        onCreated(customer.id);
      }}
    />
  );
}
