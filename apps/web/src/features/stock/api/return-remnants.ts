import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, ReturnRemnantsInput, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `POST /api/jobs/:id/remnants`: what the crew did not use, back in stock as remnants. */
export async function returnRemnants(
  jobId: string,
  input: ReturnRemnantsInput,
): Promise<RollView[]> {
  const path = `/jobs/${encodeURIComponent(jobId)}/remnants`;
  return (await api.post<ItemResponse<RollView[]>>(path, input)).data;
}

export function useReturnRemnants(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReturnRemnantsInput) => returnRemnants(jobId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}
