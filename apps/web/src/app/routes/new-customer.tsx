import { Link, useNavigate } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { useCan, useSession } from '../../lib/session';
import { NewCustomer } from '../../features/customers/components/new-customer';
import { RouteError } from './route-error';

export function Component() {
  const navigate = useNavigate();
  const { role } = useSession();
  if (!useCan('customers.write'))
    return <NotAvailable section="Adding customers" role={role} homePath={paths.today} />;
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.customers}>← Customers</Link>
      </p>
      <PageHeader title="New customer" subtitle="Add the sites (addresses) on the next page." />
      <div className="rounded-lg border border-line bg-white p-6">
        <NewCustomer
          onCreated={(id) => void navigate(paths.customer(id))}
          onCancel={() => void navigate(paths.customers)}
        />
      </div>
    </>
  );
}

export const ErrorBoundary = RouteError;
