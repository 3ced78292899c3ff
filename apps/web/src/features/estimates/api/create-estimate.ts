import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateEstimateInput, EstimateView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/** `POST /api/jobs/:id/estimates`: a draft priced from the job's takeoff and the price book. */
export async function createEstimate(
  jobId: string,
  input: CreateEstimateInput = {},
): Promise<EstimateView> {
  return (
    await api.post<ItemResponse<EstimateView>>(
      `/jobs/${encodeURIComponent(jobId)}/estimates`,
      input,
    )
  ).data;
}

export function useCreateEstimate(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateEstimateInput = {}) => createEstimate(jobId, input),
    onSuccess: async (estimate) => {
      queryClient.setQueryData(estimateKeys.detail(estimate.id), estimate);
      await queryClient.invalidateQueries({ queryKey: estimateKeys.ofJob(jobId) });
    },
  });
}
