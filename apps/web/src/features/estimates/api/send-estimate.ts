import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EstimateView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/**
 * `POST /api/estimates/:id/send` `{ to? }` → 200, the estimate `sent` (e-mailed with its PDF
 * and the customer's link). Without `to` the server uses the customer's e-mail.
 */
export async function sendEstimate(id: string, to?: string): Promise<EstimateView> {
  return (
    await api.post<ItemResponse<EstimateView>>(
      `/estimates/${encodeURIComponent(id)}/send`,
      to ? { to } : {},
    )
  ).data;
}

export function useSendEstimate(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (to?: string) => sendEstimate(id, to),
    onSuccess: async (estimate) => {
      // The answer's shape is the other step's; reading the estimate again is always right.
      await queryClient.invalidateQueries({ queryKey: estimateKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: estimateKeys.ofJob(estimate.jobId) });
    },
  });
}
