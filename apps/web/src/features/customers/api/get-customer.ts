import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { CustomerView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { customerKeys } from './customer-keys';

/** `GET /api/customers/:id`. */
export async function getCustomer(id: string, signal?: AbortSignal): Promise<CustomerView> {
  const body = await api.get<ItemResponse<CustomerView>>(`/customers/${encodeURIComponent(id)}`, {
    signal,
  });
  return body.data;
}

export function customerQueryOptions(id: string) {
  return queryOptions({
    queryKey: customerKeys.detail(id),
    queryFn: ({ signal }) => getCustomer(id, signal),
  });
}

export function useCustomer(id: string): CustomerView {
  return useSuspenseQuery(customerQueryOptions(id)).data;
}
