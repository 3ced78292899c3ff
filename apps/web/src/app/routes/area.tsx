import { Suspense } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button, buttonClasses } from '../../components/ui/button';
import { Loading } from '../../components/ui/loading';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { areaUsageLabels } from '@seamwright/shared';
import { areaQueryOptions, useArea } from '../../features/areas/api/get-area';
import { jobTakeoffQueryOptions, useJobTakeoff } from '../../features/areas/api/get-job-takeoff';
import { AreaPlanView } from '../../features/areas/components/area-plan-view';
import { DeleteAreaButton } from '../../features/areas/components/delete-area-button';
import { jobKeys } from '../../features/jobs/api/job-keys';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

/** Areas can change while the job is a lead or estimated (the API's rule). */
const areaEditableStatuses = new Set(['lead', 'estimated']);

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('areas.read'))) return null;
  const area = await queryClient.ensureQueryData(areaQueryOptions(params.areaId ?? ''));
  // The cautions come with the job's takeoff (they depend on the company's settings).
  await Promise.all([
    queryClient.ensureQueryData(jobQueryOptions(area.jobId)),
    queryClient.ensureQueryData(jobTakeoffQueryOptions(area.jobId)),
  ]);
  return null;
}

function AreaRoute({ areaId }: { areaId: string }) {
  const area = useArea(areaId);
  const job = useJob(area.jobId);
  const takeoff = useJobTakeoff(area.jobId);
  const navigate = useNavigate();
  const canChange = useCan('areas.write') && areaEditableStatuses.has(job.status);
  const cautions = takeoff.areas.find((entry) => entry.id === areaId)?.cautions ?? [];
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.job(job.id)}>← {job.title}</Link>
      </p>
      <PageHeader
        title={area.name}
        subtitle={`${areaUsageLabels[area.usage]} · ${job.title} · ${job.customer.name}`}
        actions={
          <>
            {canChange ? (
              <Link to={paths.editArea(areaId)} className={buttonClasses('primary')}>
                Change area
              </Link>
            ) : null}
            <Button variant="secondary" onClick={() => window.print()}>
              Print plan and cut sheet
            </Button>
            {canChange ? (
              <DeleteAreaButton
                area={area}
                onDeleted={() => {
                  void queryClient.invalidateQueries({ queryKey: jobKeys.detail(job.id) });
                  void navigate(paths.job(job.id), { replace: true });
                }}
              />
            ) : null}
          </>
        }
      />
      <Suspense fallback={<Loading />}>
        <AreaPlanView area={area} cautions={cautions} />
      </Suspense>
    </>
  );
}

export function Component() {
  const { areaId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('areas.read'))
    return <NotAvailable section="Areas" role={role} homePath={paths.today} />;
  return <AreaRoute areaId={areaId} />;
}

export const ErrorBoundary = RouteError;
