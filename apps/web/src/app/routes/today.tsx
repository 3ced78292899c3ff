import { useSession } from '../../lib/session';
import { NextJobs } from '../../features/jobs/components/next-jobs';
import { TodayOverview } from '../../features/today/components/today-overview';
import { RouteError } from './route-error';

export function Component() {
  const { role } = useSession();
  // Crew leads' jobs come through bookings (calendar work); Today tells them so on its own.
  return <TodayOverview nextJobs={role === 'crew_lead' ? null : <NextJobs role={role} />} />;
}

export const ErrorBoundary = RouteError;
