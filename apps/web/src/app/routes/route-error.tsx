import { isRouteErrorResponse, useRouteError, useRevalidator } from 'react-router-dom';
import { ErrorPanel } from '../../components/ui/region-error';

/** The error boundary of one route: the page's region fails, the rail and the rest stay. */
export function RouteError() {
  const error = useRouteError();
  const revalidator = useRevalidator();
  if (isRouteErrorResponse(error) && error.status === 404) {
    return <ErrorPanel error={new Error('Page not found')} />;
  }
  return <ErrorPanel error={error} onRetry={() => void revalidator.revalidate()} />;
}
