import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { RegionErrorBoundary } from '../../components/ui/region-error';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { customerKeys } from '../../features/customers/api/customer-keys';
import { customerQueryOptions, useCustomer } from '../../features/customers/api/get-customer';
import { CustomerDetails } from '../../features/customers/components/customer-details';
import { sitesQueryOptions } from '../../features/sites/api/get-sites';
import { SitesPanel } from '../../features/sites/components/sites-panel';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('customers.read'))) return null;
  const id = params.customerId ?? '';
  await Promise.all([
    queryClient.ensureQueryData(customerQueryOptions(id)),
    queryClient.ensureInfiniteQueryData(sitesQueryOptions(id)),
  ]);
  return null;
}

function CustomerPage({ customerId }: { customerId: string }) {
  const customer = useCustomer(customerId);
  const navigate = useNavigate();
  const canWriteSites = useCan('sites.write');
  const canStartJob = useCan('jobs.write');
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.customers}>← Customers</Link>
      </p>
      <PageHeader
        title={customer.name}
        subtitle={customer.archivedAt ? 'Archived customer' : undefined}
        actions={
          canStartJob && customer.siteCount > 0 ? (
            <Link to={paths.newJob(customerId)} className={buttonClasses('primary')}>
              New job
            </Link>
          ) : null
        }
      />
      <CustomerDetails
        customerId={customerId}
        onDeleted={() => void navigate(paths.customers, { replace: true })}
      />
      <RegionErrorBoundary>
        {/* Adding or deleting a site changes the customer's site count in every customer query. */}
        <SitesPanel
          customerId={customerId}
          canWrite={canWriteSites}
          onSitesChanged={() => queryClient.invalidateQueries({ queryKey: customerKeys.all })}
        />
      </RegionErrorBoundary>
    </>
  );
}

export function Component() {
  const { customerId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('customers.read'))
    return <NotAvailable section="Customers" role={role} homePath={paths.today} />;
  return <CustomerPage customerId={customerId} />;
}

export const ErrorBoundary = RouteError;
