import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { JobPage } from '../../features/jobs/components/job-page';
import { statusLabel } from '../../features/jobs/components/job-status';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('jobs.read'))) return null;
  await queryClient.ensureQueryData(jobQueryOptions(params.jobId ?? ''));
  return null;
}

function JobRoute({ jobId }: { jobId: string }) {
  const job = useJob(jobId);
  const { company } = useSession();
  const canWrite = useCan('jobs.write');
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.jobs}>← Jobs</Link>
      </p>
      <PageHeader
        title={job.title}
        subtitle={`${statusLabel(job.status)} · ${job.customer.name}`}
      />
      <JobPage job={job} canWrite={canWrite} timeZone={company.timeZone} />
    </>
  );
}

export function Component() {
  const { jobId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('jobs.read'))
    return <NotAvailable section="Jobs" role={role} homePath={paths.today} />;
  return <JobRoute jobId={jobId} />;
}

export const ErrorBoundary = RouteError;
