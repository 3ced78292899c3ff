import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ListResponse, PriceBookItemView, TurfAttributes } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';

/** A turf item of the price book, as the area form offers it. */
export interface TurfProductChoice {
  id: string;
  name: string;
  rollWidthsFt: number[];
  maxRollLengthFt: number;
}

/**
 * `GET /api/price-book?kind=turf`: the company's turf products (one page of 100, far more than
 * a price book holds). Its own small fetcher: features do not import the estimating feature.
 */
export async function getTurfProducts(signal?: AbortSignal): Promise<TurfProductChoice[]> {
  const body = await api.get<ListResponse<PriceBookItemView>>('/price-book', {
    signal,
    query: { kind: 'turf', page: 1, pageSize: 100 },
  });
  return body.data.flatMap((item) => {
    if (item.kind !== 'turf') return [];
    const attributes: TurfAttributes = item.attributes;
    return [
      {
        id: item.id,
        name: item.name,
        rollWidthsFt: attributes.rollWidthsFt,
        maxRollLengthFt: attributes.maxRollLengthFt,
      },
    ];
  });
}

export function turfProductsQueryOptions() {
  return queryOptions({
    queryKey: areaKeys.turfProducts(),
    queryFn: ({ signal }) => getTurfProducts(signal),
  });
}

export function useTurfProducts(): TurfProductChoice[] {
  return useSuspenseQuery(turfProductsQueryOptions()).data;
}
