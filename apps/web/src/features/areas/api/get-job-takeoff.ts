import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse, JobTakeoffView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';

/** `GET /api/jobs/:id/takeoff`: the materials of all the job's areas, and their cautions. */
export async function getJobTakeoff(jobId: string, signal?: AbortSignal): Promise<JobTakeoffView> {
  const body = await api.get<ItemResponse<JobTakeoffView>>(
    `/jobs/${encodeURIComponent(jobId)}/takeoff`,
    { signal },
  );
  return body.data;
}

export function jobTakeoffQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: areaKeys.jobTakeoff(jobId),
    queryFn: ({ signal }) => getJobTakeoff(jobId, signal),
  });
}

export function useJobTakeoff(jobId: string): JobTakeoffView {
  return useSuspenseQuery(jobTakeoffQueryOptions(jobId)).data;
}
