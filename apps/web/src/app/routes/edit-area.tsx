import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { areaQueryOptions, useArea } from '../../features/areas/api/get-area';
import { turfProductsQueryOptions } from '../../features/areas/api/get-turf-products';
import { jobKeys } from '../../features/jobs/api/job-keys';
import { AreaEditorPage } from './area-editor-page';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('areas.write'))) return null;
  await Promise.all([
    queryClient.ensureQueryData(areaQueryOptions(params.areaId ?? '')),
    queryClient.ensureQueryData(turfProductsQueryOptions()),
  ]);
  return null;
}

function EditAreaRoute({ areaId }: { areaId: string }) {
  const area = useArea(areaId);
  const navigate = useNavigate();
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.area(areaId)}>← {area.name}</Link>
      </p>
      <PageHeader title={`Change ${area.name}`} subtitle="It is planned again when you save." />
      <AreaEditorPage
        jobId={area.jobId}
        area={area}
        onSaved={(saved) => {
          void queryClient.invalidateQueries({ queryKey: jobKeys.detail(saved.jobId) });
          void navigate(paths.area(saved.id));
        }}
        onCancel={() => void navigate(paths.area(areaId))}
      />
    </>
  );
}

export function Component() {
  const { areaId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('areas.write'))
    return <NotAvailable section="Changing areas" role={role} homePath={paths.today} />;
  return <EditAreaRoute areaId={areaId} />;
}

export const ErrorBoundary = RouteError;
