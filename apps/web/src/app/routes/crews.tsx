import { Link } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { crewsQueryOptions } from '../../features/crews/api/crews-api';
import { CrewsPanel } from '../../features/crews/components/crews-panel';
import { RouteError } from './route-error';

export function loader() {
  void queryClient.prefetchQuery(crewsQueryOptions());
  return null;
}

export function Component() {
  return (
    <div className="flex max-w-3xl flex-col gap-6">
      <PageHeader
        title="Crews"
        subtitle="Who goes out together, their colour on the calendar, their days and how many jobs a day they take."
        actions={<Link to={paths.calendar}>Open the calendar</Link>}
      />
      <CrewsPanel />
    </div>
  );
}

export const ErrorBoundary = RouteError;
