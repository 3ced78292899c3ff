import { useMutation } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Button, buttonClasses } from '../../components/ui/button';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { api } from '../../lib/api-client';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { invoiceKeys } from '../../features/invoices/api/invoice-keys';
import {
  invoicePdfUrl,
  invoiceQueryOptions,
  useInvoice,
} from '../../features/invoices/api/get-invoice';
import { InvoicePage } from '../../features/invoices/components/invoice-page';
import { InvoiceStatusBadge } from '../../features/invoices/components/invoice-status';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('invoices.read'))) return null;
  await queryClient.ensureQueryData(invoiceQueryOptions(params.invoiceId ?? ''));
  return null;
}

function InvoiceRoute({ invoiceId }: { invoiceId: string }) {
  const invoice = useInvoice(invoiceId);
  const canWrite = useCan('invoices.write');
  const send = useMutation({
    mutationFn: () => api.post(`/invoices/${encodeURIComponent(invoiceId)}/send`, {}),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invoiceKeys.all }),
  });
  const sendable = canWrite && invoice.status !== 'void';
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.invoices}>← Invoices</Link>
      </p>
      <PageHeader
        title={`Invoice ${invoice.reference}`}
        subtitle={
          <>
            <InvoiceStatusBadge status={invoice.status} /> ·{' '}
            <Link to={paths.job(invoice.jobId)}>{invoice.jobTitle}</Link> · {invoice.customerName}
          </>
        }
        actions={
          <>
            <a href={invoicePdfUrl(invoice.id)} className={buttonClasses('secondary')}>
              Download PDF
            </a>
            {sendable ? (
              <Button onClick={() => send.mutate()} disabled={send.isPending}>
                {invoice.status === 'draft' ? 'Send to the customer' : 'Send again'}
              </Button>
            ) : null}
          </>
        }
      />
      {send.isError ? (
        <p role="alert" className="mb-4 rounded border border-ink p-3">
          The invoice could not be sent: {send.error.message}
        </p>
      ) : null}
      <InvoicePage invoice={invoice} />
    </>
  );
}

export function Component() {
  const { invoiceId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('invoices.read'))
    return <NotAvailable section="Invoices" role={role} homePath={paths.today} />;
  return <InvoiceRoute invoiceId={invoiceId} />;
}

export const ErrorBoundary = RouteError;
