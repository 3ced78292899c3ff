import { TodayOverview } from '../../features/today/components/today-overview';
import { RouteError } from './route-error';

export function Component() {
  return <TodayOverview />;
}

export const ErrorBoundary = RouteError;
