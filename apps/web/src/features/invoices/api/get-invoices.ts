import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { InvoiceSummaryView, ListResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import type { InvoiceListParams } from '../utils/list-params';
import { invoiceKeys } from './invoice-keys';

/** `GET /api/invoices`: one page of the company's invoices, newest number first. */
export function getInvoices(
  params: InvoiceListParams,
  signal?: AbortSignal,
): Promise<ListResponse<InvoiceSummaryView>> {
  return api.get<ListResponse<InvoiceSummaryView>>('/invoices', {
    query: {
      page: params.page,
      pageSize: params.pageSize,
      status: params.status.length ? params.status.join(',') : undefined,
    },
    signal,
  });
}

export function invoicesQueryOptions(params: InvoiceListParams) {
  return queryOptions({
    queryKey: invoiceKeys.list(params),
    queryFn: ({ signal }) => getInvoices(params, signal),
  });
}

/** Keeps showing the previous page while the next one loads, so the table does not jump. */
export function useInvoices(params: InvoiceListParams) {
  return useQuery({ ...invoicesQueryOptions(params), placeholderData: keepPreviousData });
}
