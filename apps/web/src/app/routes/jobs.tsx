import { Link, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { jobsQueryOptions } from '../../features/jobs/api/get-jobs';
import { JobsList } from '../../features/jobs/components/jobs-list';
import { parseJobListParams } from '../../features/jobs/utils/list-params';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ request }: LoaderFunctionArgs) {
  if (!(await sessionCan('jobs.read'))) return null;
  const params = parseJobListParams(new URL(request.url).searchParams);
  await queryClient.ensureQueryData(jobsQueryOptions(params));
  return null;
}

/** Search, filters, sort and paging change only the URL's query; the list's query follows. */
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
  const canRead = useCan('jobs.read');
  const canWrite = useCan('jobs.write');
  if (!canRead) return <NotAvailable section="Jobs" role={role} homePath={paths.today} />;
  return (
    <>
      <PageHeader
        title="Jobs"
        subtitle="Every job from first call to final payment."
        actions={
          canWrite ? (
            <Link to={paths.newJob()} className={buttonClasses('primary')}>
              New job
            </Link>
          ) : null
        }
      />
      <JobsList />
    </>
  );
}

export const ErrorBoundary = RouteError;
