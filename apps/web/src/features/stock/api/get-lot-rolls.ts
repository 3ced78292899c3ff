import { queryOptions, useQueries } from '@tanstack/react-query';
import type { ListResponse, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize } from '../../../lib/paged-list';
import { stockKeys } from './stock-keys';

/** `GET /api/rolls?turfProductId&dyeLot`: the rolls of one lot, used-up ones too. */
export function getLotRolls(
  turfProductId: string,
  dyeLot: string,
  signal?: AbortSignal,
): Promise<ListResponse<RollView>> {
  return api.get<ListResponse<RollView>>('/rolls', {
    query: { turfProductId, dyeLot, includeEmpty: 'true', pageSize: largestPageSize },
    signal,
  });
}

export function lotRollsQueryOptions(turfProductId: string, dyeLot: string) {
  return queryOptions({
    queryKey: stockKeys.lot(turfProductId, dyeLot),
    queryFn: ({ signal }) => getLotRolls(turfProductId, dyeLot, signal),
  });
}

/** The rolls of every lot a reservation uses, by id (empty until they have loaded). */
export function useLotRolls(lots: { turfProductId: string; dyeLot: string }[]) {
  return useQueries({
    queries: lots.map((lot) => lotRollsQueryOptions(lot.turfProductId, lot.dyeLot)),
    combine: (results) =>
      new Map(results.flatMap((result) => result.data?.data ?? []).map((roll) => [roll.id, roll])),
  });
}
