import { Link, useNavigate } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { useToast } from '../../components/ui/toast';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { turfProductsQueryOptions } from '../../features/stock/api/get-turf-products';
import { ReceiveDeliveryForm } from '../../features/stock/components/receive-delivery-form';
import { stockSearchFor } from '../../features/stock/utils/list-params';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader() {
  if (!(await sessionCan('inventory.write'))) return null;
  await queryClient.ensureQueryData(turfProductsQueryOptions());
  return null;
}

export function Component() {
  const navigate = useNavigate();
  const toast = useToast();
  const { role } = useSession();
  if (!useCan('inventory.write'))
    return <NotAvailable section="Receiving turf" role={role} homePath={paths.stock} />;
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.stock}>← Stock</Link>
      </p>
      <PageHeader
        title="Receive a delivery"
        subtitle="One turf product in one dye lot; list each roll as it came off the truck."
      />
      <div className="rounded-lg border border-line bg-white p-4 sm:p-6">
        <ReceiveDeliveryForm
          onReceived={(rolls) => {
            const [first] = rolls;
            toast.show(`Received ${rolls.length === 1 ? '1 roll' : `${rolls.length} rolls`}.`);
            // The list narrowed to this product and lot, so the new rolls are on its first page.
            void navigate(
              first
                ? `${paths.stock}${stockSearchFor(first.turfProductId, first.dyeLot)}`
                : paths.stock,
            );
          }}
          onCancel={() => void navigate(paths.stock)}
        />
      </div>
    </>
  );
}

export const ErrorBoundary = RouteError;
