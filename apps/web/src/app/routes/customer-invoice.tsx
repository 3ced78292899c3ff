import { useParams, useRouteError, type LoaderFunctionArgs } from 'react-router-dom';
import { PublicCard } from '../../components/ui/public-card';
import { queryClient } from '../../lib/query-client';
import { publicInvoiceQueryOptions } from '../../features/customer-invoice/api/public-invoice';
import { CustomerInvoicePage } from '../../features/customer-invoice/components/customer-invoice-page';
import {
  deadInvoiceLinkOf,
  deadInvoiceLinkWords,
} from '../../features/customer-invoice/utils/pay-state';
import { RouteError } from './route-error';

// The customer's page from the invoice e-mail (`${APP_URL}/i/<token>`, invoice-send.service.ts).
export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(publicInvoiceQueryOptions(params.token ?? ''));
  return null;
}

export function Component() {
  const { token = '' } = useParams();
  return <CustomerInvoicePage token={token} />;
}

/** Expired, cancelled or mistyped links are the usual failures here: say which in words. */
export function ErrorBoundary() {
  const dead = deadInvoiceLinkOf(useRouteError());
  if (!dead) return <RouteError />;
  const words = deadInvoiceLinkWords[dead];
  return (
    <PublicCard title={words.title}>
      <p data-testid="dead-link" data-kind={dead}>
        {words.text}
      </p>
    </PublicCard>
  );
}
