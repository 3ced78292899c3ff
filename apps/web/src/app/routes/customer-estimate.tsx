import { useParams, useRouteError, type LoaderFunctionArgs } from 'react-router-dom';
import { queryClient } from '../../lib/query-client';
import {
  publicEstimateQueryOptions,
  usePublicEstimate,
} from '../../features/customer-estimate/api/public-estimate';
import { CustomerEstimatePage } from '../../features/customer-estimate/components/customer-estimate-page';
import { DeadLinkCard } from '../../features/customer-estimate/components/dead-link-card';
import { deadLinkOf } from '../../features/customer-estimate/utils/answer-state';
import { RouteError } from './route-error';

// The customer's page from the estimate e-mail (`${APP_URL}/e/<token>`, estimate-send.service.ts).
export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(publicEstimateQueryOptions(params.token ?? ''));
  return null;
}

export function Component() {
  const { token = '' } = useParams();
  const view = usePublicEstimate(token);
  return <CustomerEstimatePage token={token} view={view} />;
}

/** Expired, withdrawn or mistyped links are the usual failures here: say which in words. */
export function ErrorBoundary() {
  const dead = deadLinkOf(useRouteError());
  return dead ? <DeadLinkCard dead={dead} /> : <RouteError />;
}
