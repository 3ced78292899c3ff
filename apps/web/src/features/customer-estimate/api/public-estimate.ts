import { queryOptions, useMutation, useSuspenseQuery } from '@tanstack/react-query';
import type {
  AcceptEstimateData,
  DeclineEstimateData,
  EstimateAcceptanceView,
  ItemResponse,
  PublicEstimateView,
} from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';

// The customer's page has no session: the link's token is the only key to the estimate.
const base = (token: string) => `/public/estimates/${encodeURIComponent(token)}`;

export const publicEstimateKeys = {
  all: ['public-estimate'] as const,
  view: (token: string) => [...publicEstimateKeys.all, token] as const,
};

/** `GET /api/public/estimates/:token`. */
export async function getPublicEstimate(token: string): Promise<PublicEstimateView> {
  return (await api.get<ItemResponse<PublicEstimateView>>(base(token))).data;
}

export function publicEstimateQueryOptions(token: string) {
  return queryOptions({
    queryKey: publicEstimateKeys.view(token),
    queryFn: () => getPublicEstimate(token),
    // A dead link stays dead; asking again only spends the link's rate limit.
    retry: false,
  });
}

export function usePublicEstimate(token: string): PublicEstimateView {
  return useSuspenseQuery(publicEstimateQueryOptions(token)).data;
}

export function useAcceptEstimate(token: string) {
  return useMutation({
    mutationFn: async (input: AcceptEstimateData) =>
      (await api.post<ItemResponse<EstimateAcceptanceView>>(`${base(token)}/accept`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: publicEstimateKeys.view(token) }),
  });
}

export function useDeclineEstimate(token: string) {
  return useMutation({
    mutationFn: async (input: DeclineEstimateData) =>
      (await api.post<ItemResponse<{ declinedAt: string }>>(`${base(token)}/decline`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: publicEstimateKeys.view(token) }),
  });
}
