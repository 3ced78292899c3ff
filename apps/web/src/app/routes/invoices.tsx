import { paths } from '../../config/paths';
import { invoicesQueryOptions } from '../../features/invoices/api/get-invoices';
import { InvoicesList } from '../../features/invoices/components/invoices-list';
import { parseInvoiceListParams } from '../../features/invoices/utils/list-params';
import { ListPage, listLoader, revalidateOnPathChange } from './list-route';
import { RouteError } from './route-error';

export const loader = listLoader('invoices.read', parseInvoiceListParams, invoicesQueryOptions);
export const shouldRevalidate = revalidateOnPathChange;

export function Component() {
  return (
    <ListPage
      title="Invoices"
      subtitle="Deposits, progress and final invoices, with what is still owed."
      readAction="invoices.read"
      writeAction="invoices.write"
      newPath={paths.jobs}
      newLabel="Invoice a job"
    >
      <InvoicesList />
    </ListPage>
  );
}

export const ErrorBoundary = RouteError;
