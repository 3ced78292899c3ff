import { useQueryErrorResetBoundary } from '@tanstack/react-query';
import { isRouteErrorResponse, useRouteError, useRevalidator } from 'react-router-dom';
import { ErrorPanel } from '../../components/ui/region-error';

/**
 * The error boundary of one route: the page's region fails, the rail and the rest stay.
 * "Try again" resets the query error state (so a failed suspense query fetches again when the
 * page renders) and reruns the route's loaders, after which the router clears its error.
 */
export function RouteError() {
  const error = useRouteError();
  const revalidator = useRevalidator();
  const { reset } = useQueryErrorResetBoundary();
  if (isRouteErrorResponse(error) && error.status === 404) {
    return <ErrorPanel error={new Error('Page not found')} isPage />;
  }
  return (
    <ErrorPanel
      error={error}
      isPage
      onRetry={() => {
        reset();
        void revalidator.revalidate();
      }}
    />
  );
}
