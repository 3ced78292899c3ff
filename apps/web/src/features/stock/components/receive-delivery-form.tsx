import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useSession } from '../../../lib/session';
import { useUnits } from '../../../lib/units';
import { Button } from '../../../components/ui/button';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { ErrorPanel } from '../../../components/ui/region-error';
import type { RollView } from '@seamwright/shared';
import { useReceiveDelivery } from '../api/receive-delivery';
import { useTurfProducts } from '../api/get-turf-products';
import { inCompanyUnits } from '../utils/feet-words';
import { deliveryFormSchema } from '../utils/stock-forms';
import { todayIn } from '../utils/roll-words';
import { DeliveryRolls } from './delivery-rolls';

interface ReceiveDeliveryFormProps {
  onReceived: (rolls: RollView[]) => void;
  onCancel: () => void;
}

/** A delivery of one turf product in one dye lot: where it went, when, and each roll. */
export function ReceiveDeliveryForm({ onReceived, onCancel }: ReceiveDeliveryFormProps) {
  const units = useUnits();
  const { company } = useSession();
  const products = useTurfProducts();
  const receive = useReceiveDelivery();
  const schema = useMemo(() => deliveryFormSchema(units), [units]);

  if (products.isPending) return <Loading label="Loading turf products…" />;
  if (products.isError)
    return <ErrorPanel error={products.error} onRetry={() => void products.refetch()} />;
  if (products.data.length === 0)
    return (
      <EmptyState title="No turf in the price book">
        Add the turf you buy, with its roll widths, under <Link to={paths.settings}>Settings</Link>{' '}
        first; then its deliveries can be received here.
      </EmptyState>
    );

  const first = products.data.length === 1 ? products.data[0] : undefined;
  return (
    <Form
      schema={schema}
      aria-label="Receive a delivery"
      defaultValues={{
        turfProductId: first?.id ?? '',
        dyeLot: '',
        location: '',
        receivedOn: todayIn(company.timeZone),
        rolls: [{ widthFt: String(first?.rollWidthsFt[0] ?? ''), lengthFt: null }],
      }}
      onSubmit={async (values) => {
        try {
          onReceived(
            await receive.mutateAsync({
              ...values,
              rolls: values.rolls.map((r) => ({ widthFt: r.widthFt, lengthFt: r.lengthFt })),
            }),
          );
        } catch (error) {
          throw inCompanyUnits(error, units);
        }
      }}
    >
      <SelectField name="turfProductId" label="Turf product" wrapperClassName="sm:max-w-md">
        {first ? null : <option value="">Choose the product…</option>}
        {products.data.map((product) => (
          <option key={product.id} value={product.id}>
            {product.name}
          </option>
        ))}
      </SelectField>
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField
          name="dyeLot"
          label="Dye lot"
          hint="As printed on the roll labels; every roll of a delivery is one lot."
          autoComplete="off"
        />
        <TextField
          name="location"
          label="Location (optional)"
          hint="Where the rolls are kept, such as Yard rack B."
          autoComplete="off"
        />
        <TextField name="receivedOn" label="Received" type="date" />
      </div>
      <DeliveryRolls products={products.data} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton busyLabel="Saving…">Save delivery</SubmitButton>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
