import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize } from '../../../lib/paged-list';
import { stockKeys } from './stock-keys';

export interface RollProduct {
  id: string;
  name: string;
}

/** Pages read at most: 1,000 rolls, far more than a yard holds; past that the filter is short. */
const maxPages = 10;

/**
 * The turf products that have rolls, read from the rolls themselves: crew leads read stock but
 * not the price book, and there is no products-in-stock endpoint. The rolls come sorted by
 * product name, so the names come out in order.
 */
export async function getRollProducts(signal?: AbortSignal): Promise<RollProduct[]> {
  const found = new Map<string, string>();
  for (let page = 1; page <= maxPages; page += 1) {
    const { data, meta } = await api.get<ListResponse<RollView>>('/rolls', {
      query: { page, pageSize: largestPageSize, includeEmpty: 'true' },
      signal,
    });
    for (const roll of data) found.set(roll.turfProductId, roll.turfProductName);
    if (page * largestPageSize >= meta.total) break;
  }
  return [...found].map(([id, name]) => ({ id, name }));
}

export function rollProductsQueryOptions() {
  return queryOptions({
    queryKey: stockKeys.products(),
    queryFn: ({ signal }) => getRollProducts(signal),
  });
}

export function useRollProducts() {
  return useQuery(rollProductsQueryOptions());
}
