import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import type { StockListParams } from '../utils/list-params';
import { stockKeys } from './stock-keys';

/** `GET /api/rolls`: one page of rolls and remnants. */
export function getRolls(
  params: StockListParams,
  signal?: AbortSignal,
): Promise<ListResponse<RollView>> {
  return api.get<ListResponse<RollView>>('/rolls', {
    query: {
      page: params.page,
      pageSize: params.pageSize,
      turfProductId: params.product || undefined,
      kind: params.kind,
      dyeLot: params.dyeLot || undefined,
      includeEmpty: params.all ? 'true' : undefined,
    },
    signal,
  });
}

export function rollsQueryOptions(params: StockListParams) {
  return queryOptions({
    queryKey: stockKeys.list(params),
    queryFn: ({ signal }) => getRolls(params, signal),
  });
}

/** Keeps showing the previous page while the next one loads, so the table does not jump. */
export function useRolls(params: StockListParams) {
  return useQuery({ ...rollsQueryOptions(params), placeholderData: keepPreviousData });
}
