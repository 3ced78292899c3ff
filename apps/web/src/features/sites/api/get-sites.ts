import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ListResponse, SiteView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** `GET /api/customers/:id/sites`: every site of one customer. */
export async function getSites(customerId: string, signal?: AbortSignal): Promise<SiteView[]> {
  const body = await api.get<ListResponse<SiteView> | { data: SiteView[] }>(
    `/customers/${encodeURIComponent(customerId)}/sites`,
    {
      query: { pageSize: 100 },
      signal,
    },
  );
  return body.data;
}

export function sitesQueryOptions(customerId: string) {
  return queryOptions({
    queryKey: siteKeys.list(customerId),
    queryFn: ({ signal }) => getSites(customerId, signal),
  });
}

export function useSites(customerId: string): SiteView[] {
  return useSuspenseQuery(sitesQueryOptions(customerId)).data;
}
