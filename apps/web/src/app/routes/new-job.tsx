import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { useCan, useSession } from '../../lib/session';
import { NewJobForm } from '../../features/jobs/components/new-job-form';
import { RouteError } from './route-error';

export function Component() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const { role } = useSession();
  const customerId = search.get('customerId') ?? '';
  const back = customerId ? paths.customer(customerId) : paths.jobs;
  if (!useCan('jobs.write'))
    return <NotAvailable section="Starting jobs" role={role} homePath={paths.today} />;
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={back}>{customerId ? '← Customer' : '← Jobs'}</Link>
      </p>
      <PageHeader
        title="New job"
        subtitle="A job starts as a lead for one of a customer's sites."
      />
      <div className="rounded-lg border border-line bg-white p-6">
        <NewJobForm
          initialCustomerId={customerId}
          onCreated={(id) => void navigate(paths.job(id))}
          onCancel={() => void navigate(back)}
        />
      </div>
    </>
  );
}

export const ErrorBoundary = RouteError;
