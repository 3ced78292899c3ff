import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse, PriceBookItemView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize } from '../../../lib/paged-list';
import { stockKeys } from './stock-keys';

export interface TurfProduct {
  id: string;
  name: string;
  rollWidthsFt: number[];
  maxRollLengthFt: number;
}

/**
 * `GET /api/price-book?kind=turf`: the turf a delivery can be of, with its roll widths. Only
 * the first 100 turf items; a price book holds a handful.
 */
export async function getTurfProducts(signal?: AbortSignal): Promise<TurfProduct[]> {
  const { data } = await api.get<ListResponse<PriceBookItemView>>('/price-book', {
    query: { kind: 'turf', pageSize: largestPageSize },
    signal,
  });
  return data.flatMap((item) =>
    item.kind === 'turf'
      ? [
          {
            id: item.id,
            name: item.name,
            rollWidthsFt: item.attributes.rollWidthsFt,
            maxRollLengthFt: item.attributes.maxRollLengthFt,
          },
        ]
      : [],
  );
}

export function turfProductsQueryOptions() {
  return queryOptions({
    queryKey: stockKeys.turfProducts(),
    queryFn: ({ signal }) => getTurfProducts(signal),
  });
}

export function useTurfProducts() {
  return useQuery(turfProductsQueryOptions());
}
