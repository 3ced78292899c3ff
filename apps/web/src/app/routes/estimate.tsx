import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { customerQueryOptions } from '../../features/customers/api/get-customer';
import { estimateQueryOptions, useEstimate } from '../../features/estimates/api/get-estimate';
import { EstimateActions } from '../../features/estimates/components/estimate-actions';
import { EstimatePage } from '../../features/estimates/components/estimate-page';
import { jobKeys } from '../../features/jobs/api/job-keys';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('estimates.read'))) return null;
  const estimate = await queryClient.ensureQueryData(estimateQueryOptions(params.estimateId ?? ''));
  const job = await queryClient.ensureQueryData(jobQueryOptions(estimate.jobId));
  // Only for the send dialog's starting address; the page does not wait for it.
  if (await sessionCan('customers.read'))
    void queryClient.prefetchQuery(customerQueryOptions(job.customerId));
  return null;
}

function EstimateRoute({ estimateId }: { estimateId: string }) {
  const estimate = useEstimate(estimateId);
  const job = useJob(estimate.jobId);
  const { company } = useSession();
  const canWrite = useCan('estimates.write');
  const canReadCustomers = useCan('customers.read');
  const customer = useQuery({ ...customerQueryOptions(job.customerId), enabled: canReadCustomers });
  const refreshJob = () => {
    void queryClient.invalidateQueries({ queryKey: jobKeys.detail(job.id) });
  };
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.job(job.id)}>← {job.title}</Link>
      </p>
      <PageHeader
        title={`Estimate, version ${estimate.version}`}
        subtitle={
          <>
            {job.title} · <Link to={paths.customer(job.customer.id)}>{job.customer.name}</Link>
          </>
        }
        actions={
          <EstimateActions
            estimate={estimate}
            canWrite={canWrite}
            customerEmail={customer.data?.email ?? null}
            onChanged={refreshJob}
          />
        }
      />
      <EstimatePage
        estimate={estimate}
        currency={company.currency}
        timeZone={company.timeZone}
        canWrite={canWrite}
        onChanged={refreshJob}
      />
    </>
  );
}

export function Component() {
  const { estimateId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('estimates.read'))
    return <NotAvailable section="Estimates" role={role} homePath={paths.today} />;
  return <EstimateRoute estimateId={estimateId} />;
}

export const ErrorBoundary = RouteError;
