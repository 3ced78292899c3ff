import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EstimateView, ItemResponse, UpdateEstimateInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/** `PATCH /api/estimates/:id` (drafts only): the answer holds the server's new totals. */
export async function updateEstimate(
  id: string,
  input: UpdateEstimateInput,
): Promise<EstimateView> {
  return (
    await api.patch<ItemResponse<EstimateView>>(`/estimates/${encodeURIComponent(id)}`, input)
  ).data;
}

export function useUpdateEstimate(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateEstimateInput) => updateEstimate(id, input),
    onSuccess: async (estimate) => {
      queryClient.setQueryData(estimateKeys.detail(id), estimate);
      await queryClient.invalidateQueries({ queryKey: estimateKeys.ofJob(estimate.jobId) });
    },
  });
}
