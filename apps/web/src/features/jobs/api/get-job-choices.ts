import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CustomerView, ItemResponse, ListResponse, SiteView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize } from '../../../lib/paged-list';
import { jobKeys } from './job-keys';

/** Active customers matching `q`, for the "New job" form's customer choice. */
export function customerChoicesQueryOptions(q: string) {
  return queryOptions({
    queryKey: jobKeys.customerChoices(q),
    queryFn: ({ signal }) =>
      api.get<ListResponse<CustomerView>>('/customers', {
        query: { q: q || undefined, pageSize: 50, sort: 'name' },
        signal,
      }),
  });
}

export function useCustomerChoices(q: string) {
  return useQuery(customerChoicesQueryOptions(q));
}

/** One customer's sites (the first 100), for the site choice. */
export function siteChoicesQueryOptions(customerId: string) {
  return queryOptions({
    queryKey: jobKeys.siteChoices(customerId),
    queryFn: ({ signal }) =>
      api.get<ListResponse<SiteView>>(`/customers/${encodeURIComponent(customerId)}/sites`, {
        query: { pageSize: largestPageSize },
        signal,
      }),
    enabled: customerId !== '',
  });
}

export function useSiteChoices(customerId: string) {
  return useQuery(siteChoicesQueryOptions(customerId));
}

/** The customer a "New job" link from their page starts on (they may not be in the first 50). */
export function useChosenCustomer(customerId: string) {
  return useQuery({
    queryKey: [...jobKeys.all, 'chosen-customer', customerId] as const,
    queryFn: ({ signal }) =>
      api.get<ItemResponse<CustomerView>>(`/customers/${encodeURIComponent(customerId)}`, {
        signal,
      }),
    enabled: customerId !== '',
  });
}
