import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { EstimateView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/** `GET /api/estimates/:id`: one version with its tiers, lines and totals. */
export async function getEstimate(id: string, signal?: AbortSignal): Promise<EstimateView> {
  const body = await api.get<ItemResponse<EstimateView>>(`/estimates/${encodeURIComponent(id)}`, {
    signal,
  });
  return body.data;
}

export function estimateQueryOptions(id: string) {
  return queryOptions({
    queryKey: estimateKeys.detail(id),
    queryFn: ({ signal }) => getEstimate(id, signal),
  });
}

export function useEstimate(id: string): EstimateView {
  return useSuspenseQuery(estimateQueryOptions(id)).data;
}
