import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `GET /api/rolls/:id`: one roll or remnant. */
export async function getRoll(id: string, signal?: AbortSignal): Promise<RollView> {
  return (await api.get<ItemResponse<RollView>>(`/rolls/${encodeURIComponent(id)}`, { signal }))
    .data;
}

export function rollQueryOptions(id: string) {
  return queryOptions({
    queryKey: stockKeys.detail(id),
    queryFn: ({ signal }) => getRoll(id, signal),
  });
}

export function useRoll(id: string): RollView {
  return useSuspenseQuery(rollQueryOptions(id)).data;
}
