import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useToast } from '../../../components/ui/toast';
import { describeError } from '../../../components/ui/region-error';
import { formatDate } from '../../../lib/format';
import { useFocusWhenShown } from '../../../lib/focus-when-shown';
import { useCan, useSession } from '../../../lib/session';
import { useCustomer } from '../api/get-customer';
import { useUpdateCustomer } from '../api/update-customer';
import { useDeleteCustomer } from '../api/delete-customer';
import { CustomerForm } from './customer-form';

function Detail({ label, value }: { label: string; value: string | null }) {
  return (
    <div>
      <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
      <dd className="whitespace-pre-line">
        {value ?? <span className="text-ink-muted">Not given</span>}
      </dd>
    </div>
  );
}

/** A customer's details with edit, archive (undoable) and delete. */
export function CustomerDetails({
  customerId,
  onDeleted,
}: {
  customerId: string;
  onDeleted: () => void;
}) {
  const customer = useCustomer(customerId);
  const { company } = useSession();
  const canWrite = useCan('customers.write');
  const canSeeBilling = useCan('customers.billing.read');
  const update = useUpdateCustomer(customerId);
  const remove = useDeleteCustomer(customerId);
  const toast = useToast();
  const [isEditing, setIsEditing] = useState(false);
  const [isConfirmingDelete, setIsConfirmingDelete] = useState(false);
  const { target: editButtonRef, request: focusEditButton } =
    useFocusWhenShown<HTMLButtonElement>();
  const { target: formHeadingRef, request: focusFormHeading } =
    useFocusWhenShown<HTMLHeadingElement>();
  const startEditing = () => {
    focusFormHeading();
    setIsEditing(true);
  };
  const stopEditing = () => {
    focusEditButton();
    setIsEditing(false);
  };

  const archive = async () => {
    try {
      await update.mutateAsync({ archived: true });
    } catch (error) {
      toast.show(describeError(error).detail);
      return;
    }
    toast.show(`${customer.name} archived.`, {
      label: 'Undo',
      onClick: () => void update.mutateAsync({ archived: false }),
    });
  };

  if (isEditing) {
    return (
      <section
        aria-labelledby="customer-edit-heading"
        className="rounded-lg border border-line bg-white p-6"
      >
        <h2
          id="customer-edit-heading"
          ref={formHeadingRef}
          tabIndex={-1}
          className="mb-4 text-xl font-bold"
        >
          Edit customer
        </h2>
        <CustomerForm
          customer={customer}
          submitLabel="Save changes"
          onCancel={stopEditing}
          onSubmit={async (values) => {
            await update.mutateAsync(values);
            stopEditing();
            toast.show('Changes saved.');
          }}
        />
      </section>
    );
  }

  return (
    <section
      aria-labelledby="customer-details-heading"
      className="rounded-lg border border-line bg-white p-6"
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <h2 id="customer-details-heading" className="text-xl font-bold">
          Details
        </h2>
        {canWrite ? (
          <div className="flex flex-wrap gap-2 print:hidden">
            <Button variant="secondary" ref={editButtonRef} onClick={startEditing}>
              Edit
            </Button>
            {customer.archivedAt ? (
              <Button
                variant="secondary"
                isBusy={update.isPending}
                onClick={() => void update.mutateAsync({ archived: false })}
              >
                Restore
              </Button>
            ) : (
              <Button variant="secondary" isBusy={update.isPending} onClick={() => void archive()}>
                Archive
              </Button>
            )}
            <Button variant="danger" onClick={() => setIsConfirmingDelete(true)}>
              Delete
            </Button>
          </div>
        ) : null}
      </div>
      {customer.archivedAt ? (
        <p className="mt-3 rounded bg-sand-100 px-3 py-2">
          Archived on {formatDate(customer.archivedAt, company.timeZone)}. Archived customers stay
          out of the list until you show them.
        </p>
      ) : null}
      <dl className="mt-4 grid gap-4 sm:grid-cols-2">
        {canSeeBilling ? (
          <>
            <Detail label="Phone" value={customer.phone} />
            <Detail label="E-mail" value={customer.email} />
            <Detail label="Billing address" value={customer.billingAddress} />
          </>
        ) : null}
        <Detail label="Notes" value={customer.notes} />
        <Detail label="Added" value={formatDate(customer.createdAt, company.timeZone)} />
      </dl>
      <ConfirmDialog
        isOpen={isConfirmingDelete}
        title={`Delete ${customer.name}?`}
        confirmLabel="Delete customer"
        isBusy={remove.isPending}
        onCancel={() => setIsConfirmingDelete(false)}
        onConfirm={() =>
          void remove.mutateAsync().then(
            () => {
              setIsConfirmingDelete(false);
              toast.show(`${customer.name} deleted.`);
              onDeleted();
            },
            (error: unknown) => {
              setIsConfirmingDelete(false);
              toast.show(describeError(error).detail);
            },
          )
        }
      >
        This removes the customer and their{' '}
        {customer.siteCount === 1 ? 'site' : `${customer.siteCount} sites`} for good. If you only
        want them out of the way, archive instead.
      </ConfirmDialog>
    </section>
  );
}
