import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { turfProductsQueryOptions } from '../../features/areas/api/get-turf-products';
import { jobKeys } from '../../features/jobs/api/job-keys';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { AreaEditorPage } from './area-editor-page';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('areas.write'))) return null;
  await Promise.all([
    queryClient.ensureQueryData(jobQueryOptions(params.jobId ?? '')),
    queryClient.ensureQueryData(turfProductsQueryOptions()),
  ]);
  return null;
}

function NewAreaRoute({ jobId }: { jobId: string }) {
  const job = useJob(jobId);
  const navigate = useNavigate();
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.job(jobId)}>← {job.title}</Link>
      </p>
      <PageHeader
        title="New area"
        subtitle={`Draw the area for ${job.title}; it is planned when you save.`}
      />
      <AreaEditorPage
        jobId={jobId}
        area={null}
        onSaved={(area) => {
          // The job's activity now lists the new area.
          void queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) });
          void navigate(paths.area(area.id));
        }}
        onCancel={() => void navigate(paths.job(jobId))}
      />
    </>
  );
}

export function Component() {
  const { jobId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('areas.write'))
    return <NotAvailable section="Adding areas" role={role} homePath={paths.today} />;
  return <NewAreaRoute jobId={jobId} />;
}

export const ErrorBoundary = RouteError;
