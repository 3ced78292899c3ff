import { Suspense } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Loading } from '../../components/ui/loading';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { RegionErrorBoundary } from '../../components/ui/region-error';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { jobAreasQueryOptions } from '../../features/areas/api/get-job-areas';
import { jobTakeoffQueryOptions } from '../../features/areas/api/get-job-takeoff';
import { JobAreasSection } from '../../features/areas/components/job-areas-section';
import { jobEstimatesQueryOptions } from '../../features/estimates/api/get-job-estimates';
import { JobEstimatesSection } from '../../features/estimates/components/job-estimates-section';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { jobKeys } from '../../features/jobs/api/job-keys';
import { JobPage } from '../../features/jobs/components/job-page';
import { statusLabel } from '../../features/jobs/components/job-status';
import { JobTurfPanel } from '../../features/stock/components/job-turf-panel';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

/** Areas and estimates can change while the job is a lead or estimated (the API's rule). */
const areaEditableStatuses = new Set(['lead', 'estimated']);

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('jobs.read'))) return null;
  const jobId = params.jobId ?? '';
  // Areas and their takeoff warm alongside the job; their section has its own error boundary.
  if (await sessionCan('areas.read')) {
    void queryClient.prefetchQuery(jobAreasQueryOptions(jobId));
    void queryClient.prefetchQuery(jobTakeoffQueryOptions(jobId));
  }
  if (await sessionCan('estimates.read'))
    void queryClient.prefetchQuery(jobEstimatesQueryOptions(jobId));
  await queryClient.ensureQueryData(jobQueryOptions(jobId));
  return null;
}

function JobRoute({ jobId }: { jobId: string }) {
  const job = useJob(jobId);
  const { company } = useSession();
  const canWrite = useCan('jobs.write');
  const canReadAreas = useCan('areas.read');
  const canWriteAreas = useCan('areas.write');
  const canWriteStock = useCan('inventory.write');
  const canReadEstimates = useCan('estimates.read');
  const canWriteEstimates = useCan('estimates.write');
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.jobs}>← Jobs</Link>
      </p>
      <PageHeader
        title={job.title}
        subtitle={`${statusLabel(job.status)} · ${job.customer.name}`}
      />
      <JobPage
        job={job}
        canWrite={canWrite}
        timeZone={company.timeZone}
        areas={
          canReadAreas ? (
            <RegionErrorBoundary>
              <Suspense fallback={<Loading label="Loading the areas…" />}>
                <JobAreasSection
                  jobId={jobId}
                  canAdd={canWriteAreas && areaEditableStatuses.has(job.status)}
                />
              </Suspense>
            </RegionErrorBoundary>
          ) : undefined
        }
        turf={
          <RegionErrorBoundary>
            <JobTurfPanel jobId={jobId} jobStatus={job.status} canWrite={canWriteStock} />
          </RegionErrorBoundary>
        }
        estimates={
          canReadEstimates ? (
            <RegionErrorBoundary>
              <Suspense fallback={<Loading label="Loading the estimates…" />}>
                <JobEstimatesSection
                  jobId={jobId}
                  canBuild={canWriteEstimates && areaEditableStatuses.has(job.status)}
                  onBuilt={() => {
                    void queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) });
                  }}
                />
              </Suspense>
            </RegionErrorBoundary>
          ) : undefined
        }
      />
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
