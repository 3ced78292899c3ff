import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EstimateView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/** `POST /api/estimates/:id/revisions`: a sent version copied into the next draft. */
export async function reviseEstimate(id: string): Promise<EstimateView> {
  return (
    await api.post<ItemResponse<EstimateView>>(`/estimates/${encodeURIComponent(id)}/revisions`, {})
  ).data;
}

export function useReviseEstimate(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => reviseEstimate(id),
    onSuccess: async (next) => {
      queryClient.setQueryData(estimateKeys.detail(next.id), next);
      // The old version is now superseded.
      await queryClient.invalidateQueries({ queryKey: estimateKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: estimateKeys.ofJob(next.jobId) });
    },
  });
}
