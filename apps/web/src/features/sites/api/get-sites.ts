import { infiniteQueryOptions, useSuspenseInfiniteQuery } from '@tanstack/react-query';
import type { ListResponse, SiteView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize, nextPageOf, toPagedList, type PagedList } from '../../../lib/paged-list';
import { siteKeys } from './site-keys';

/** `GET /api/customers/:id/sites`: one page of a customer's sites, oldest first. */
export function getSitesPage(
  customerId: string,
  page: number,
  signal?: AbortSignal,
): Promise<ListResponse<SiteView>> {
  return api.get<ListResponse<SiteView>>(`/customers/${encodeURIComponent(customerId)}/sites`, {
    query: { page, pageSize: largestPageSize },
    signal,
  });
}

/** Pages are added on request ("Show more"), so a customer with many sites never loses any. */
export function sitesQueryOptions(customerId: string) {
  return infiniteQueryOptions({
    queryKey: siteKeys.list(customerId),
    queryFn: ({ pageParam, signal }) => getSitesPage(customerId, pageParam, signal),
    initialPageParam: 1,
    getNextPageParam: nextPageOf,
  });
}

export function useSites(customerId: string): PagedList<SiteView> {
  return toPagedList(useSuspenseInfiniteQuery(sitesQueryOptions(customerId)));
}
