import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse, PriceBookItemView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

export interface TurfChoice {
  id: string;
  name: string;
}

/**
 * `GET /api/price-book?kind=turf`: the turf products a new option may be priced with. Its own
 * small fetcher: features do not import the estimating or areas features.
 */
export async function getTurfChoices(signal?: AbortSignal): Promise<TurfChoice[]> {
  const body = await api.get<ListResponse<PriceBookItemView>>('/price-book', {
    signal,
    query: { kind: 'turf', page: 1, pageSize: 100 },
  });
  return body.data.map((item) => ({ id: item.id, name: item.name }));
}

export function turfChoicesQueryOptions() {
  return queryOptions({
    queryKey: estimateKeys.turfProducts(),
    queryFn: ({ signal }) => getTurfChoices(signal),
  });
}

/** Not suspending: the add-option form works without the list (same turf as copied). */
export function useTurfChoices(enabled: boolean): TurfChoice[] {
  return useQuery({ ...turfChoicesQueryOptions(), enabled }).data ?? [];
}
