import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { CustomerView, ListResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import type { CustomerListParams } from '../utils/list-params';
import { customerKeys } from './customer-keys';

/** `GET /api/customers`: one page of the company's customers. */
export function getCustomers(
  params: CustomerListParams,
  signal?: AbortSignal,
): Promise<ListResponse<CustomerView>> {
  return api.get<ListResponse<CustomerView>>('/customers', {
    query: {
      page: params.page,
      pageSize: params.pageSize,
      sort: params.sort,
      q: params.q || undefined,
      status: params.status,
    },
    signal,
  });
}

export function customersQueryOptions(params: CustomerListParams) {
  return queryOptions({
    queryKey: customerKeys.list(params),
    queryFn: ({ signal }) => getCustomers(params, signal),
  });
}

/** Keeps showing the previous page while the next one loads, so the table does not jump. */
export function useCustomers(params: CustomerListParams) {
  return useQuery({ ...customersQueryOptions(params), placeholderData: keepPreviousData });
}
