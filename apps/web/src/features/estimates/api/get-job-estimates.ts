import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { EstimateView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimateKeys } from './estimate-keys';

/** `GET /api/jobs/:id/estimates`: the job's estimate versions, newest first. */
export async function getJobEstimates(
  jobId: string,
  signal?: AbortSignal,
): Promise<EstimateView[]> {
  const body = await api.get<ItemResponse<EstimateView[]>>(
    `/jobs/${encodeURIComponent(jobId)}/estimates`,
    { signal },
  );
  return body.data;
}

export function jobEstimatesQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: estimateKeys.ofJob(jobId),
    queryFn: ({ signal }) => getJobEstimates(jobId, signal),
  });
}

export function useJobEstimates(jobId: string): EstimateView[] {
  return useSuspenseQuery(jobEstimatesQueryOptions(jobId)).data;
}
