import { Link, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { customersQueryOptions } from '../../features/customers/api/get-customers';
import { CustomersList } from '../../features/customers/components/customers-list';
import { parseCustomerListParams } from '../../features/customers/utils/list-params';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ request }: LoaderFunctionArgs) {
  if (!(await sessionCan('customers.read'))) return null;
  const params = parseCustomerListParams(new URL(request.url).searchParams);
  await queryClient.ensureQueryData(customersQueryOptions(params));
  return null;
}

/** Search, sort and paging change only the URL's query; the list's own query follows them. */
export function shouldRevalidate({
  currentUrl,
  nextUrl,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  if (currentUrl.pathname === nextUrl.pathname) return false;
  return defaultShouldRevalidate;
}

export function Component() {
  const { role } = useSession();
  const canRead = useCan('customers.read');
  const canWrite = useCan('customers.write');
  if (!canRead) return <NotAvailable section="Customers" role={role} homePath={paths.today} />;
  return (
    <>
      <PageHeader
        title="Customers"
        subtitle="The people you build for, and their sites."
        actions={
          canWrite ? (
            <Link to={paths.newCustomer} className={buttonClasses('primary')}>
              New customer
            </Link>
          ) : null
        }
      />
      <CustomersList />
    </>
  );
}

export const ErrorBoundary = RouteError;
