import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';
import type { Area } from './area-types';

/** `GET /api/jobs/:id/areas`: the job's areas with their saved plans, oldest first. */
export async function getJobAreas(jobId: string, signal?: AbortSignal): Promise<Area[]> {
  const body = await api.get<ItemResponse<Area[]>>(`/jobs/${encodeURIComponent(jobId)}/areas`, {
    signal,
  });
  return body.data;
}

export function jobAreasQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: areaKeys.jobList(jobId),
    queryFn: ({ signal }) => getJobAreas(jobId, signal),
  });
}

export function useJobAreas(jobId: string): Area[] {
  return useSuspenseQuery(jobAreasQueryOptions(jobId)).data;
}
