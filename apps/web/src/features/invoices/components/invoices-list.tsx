import { useMemo } from 'react';
import { invoiceStatuses } from '@seamwright/shared';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { listQueryFrame } from '../../../components/ui/list-query-frame';
import { useUrlListParams } from '../../../lib/use-url-list-params';
import { useInvoices } from '../api/get-invoices';
import {
  invoicePageSizes,
  parseInvoiceListParams,
  toggleInvoiceStatus,
  toInvoiceSearchParams,
  type InvoiceListParams,
} from '../utils/list-params';
import { invoiceColumns } from './invoice-columns';
import { invoiceStatusLabels } from './invoice-status';

function StatusFilter(props: {
  params: InvoiceListParams;
  onChange: (change: Partial<InvoiceListParams>) => void;
}) {
  return (
    <fieldset className="mb-4 print:hidden">
      <legend className="mb-1 font-semibold">Status</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {invoiceStatuses.map((status) => (
          <label key={status} className="flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              className="h-5 w-5 accent-moss-700"
              checked={props.params.status.includes(status)}
              onChange={() =>
                props.onChange({ status: toggleInvoiceStatus(props.params.status, status) })
              }
            />
            {invoiceStatusLabels[status]}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** The invoices list; the status filter and the page live in the URL. */
export function InvoicesList() {
  const { params, update } = useUrlListParams(
    parseInvoiceListParams,
    toInvoiceSearchParams,
    'status',
  );
  const columns = useMemo(() => invoiceColumns(), []);
  const query = useInvoices(params);
  const filters = <StatusFilter params={params} onChange={update} />;
  const pending = listQueryFrame(query, filters, 'Loading invoices…');
  if (pending || !query.data) return pending;
  const { data, meta } = query.data;
  if (meta.total === 0)
    return (
      <>
        {filters}
        <EmptyState title={params.status.length ? 'No invoices match' : 'No invoices yet'}>
          {params.status.length
            ? 'Tick more statuses to see more invoices.'
            : 'Invoices are made from a job with an accepted estimate: a deposit, progress or final invoice.'}
        </EmptyState>
      </>
    );
  return (
    <>
      {filters}
      <DataTable
        caption="Invoices"
        columns={columns}
        data={data}
        total={meta.total}
        page={params.page}
        pageSize={params.pageSize}
        pageSizeOptions={invoicePageSizes}
        // The server orders by number, newest first; no column sorts.
        sort={{ field: 'reference', direction: 'desc' }}
        onSortChange={() => undefined}
        isFetching={query.isPlaceholderData}
        onPageChange={(page) => update({ page })}
        onPageSizeChange={(pageSize) =>
          update({ pageSize: invoicePageSizes.find((s) => s === pageSize) ?? 25 })
        }
      />
    </>
  );
}
