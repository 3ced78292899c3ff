import { paths } from '../../config/paths';
import { customersQueryOptions } from '../../features/customers/api/get-customers';
import { CustomersList } from '../../features/customers/components/customers-list';
import { parseCustomerListParams } from '../../features/customers/utils/list-params';
import { ListPage, listLoader, revalidateOnPathChange } from './list-route';
import { RouteError } from './route-error';

export const loader = listLoader('customers.read', parseCustomerListParams, customersQueryOptions);
export const shouldRevalidate = revalidateOnPathChange;

export function Component() {
  return (
    <ListPage
      title="Customers"
      subtitle="The people you build for, and their sites."
      readAction="customers.read"
      writeAction="customers.write"
      newPath={paths.newCustomer}
      newLabel="New customer"
    >
      <CustomersList />
    </ListPage>
  );
}

export const ErrorBoundary = RouteError;
