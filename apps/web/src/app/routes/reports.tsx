import { useSession, useCan } from '../../lib/session';
import { queryClient } from '../../lib/query-client';
import { paths } from '../../config/paths';
import { NotAvailable } from '../../components/ui/not-available';
import { agingQueryOptions } from '../../features/reports/api/get-aging';
import { dashboardQueryOptions } from '../../features/reports/api/get-dashboard';
import { ReportsPage } from '../../features/reports/components/reports-page';
import { parseReportParams, periodQuery } from '../../features/reports/utils/report-params';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ request }: { request: Request }) {
  const params = parseReportParams(new URL(request.url).searchParams);
  if (await sessionCan('receivables.read'))
    void queryClient.prefetchQuery(agingQueryOptions(params.to));
  if (await sessionCan('dashboard.read'))
    void queryClient.prefetchQuery(dashboardQueryOptions(periodQuery(params, true)));
  return null;
}

export function Component() {
  const { company, role } = useSession();
  const canRead = useCan('receivables.read');
  const canSeeDashboard = useCan('dashboard.read');
  if (!canRead) return <NotAvailable section="Reports" role={role} homePath={paths.today} />;
  return <ReportsPage currency={company.currency} canSeeDashboard={canSeeDashboard} />;
}

export const ErrorBoundary = RouteError;
