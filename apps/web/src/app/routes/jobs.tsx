import { paths } from '../../config/paths';
import { jobsQueryOptions } from '../../features/jobs/api/get-jobs';
import { JobsList } from '../../features/jobs/components/jobs-list';
import { parseJobListParams } from '../../features/jobs/utils/list-params';
import { ListPage, listLoader, revalidateOnPathChange } from './list-route';
import { RouteError } from './route-error';

export const loader = listLoader('jobs.read', parseJobListParams, jobsQueryOptions);
export const shouldRevalidate = revalidateOnPathChange;

export function Component() {
  return (
    <ListPage
      title="Jobs"
      subtitle="Every job from first call to final payment."
      readAction="jobs.read"
      writeAction="jobs.write"
      newPath={paths.newJob()}
      newLabel="New job"
    >
      <JobsList />
    </ListPage>
  );
}

export const ErrorBoundary = RouteError;
