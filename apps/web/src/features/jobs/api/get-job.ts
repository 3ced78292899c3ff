import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse, JobDetailView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** `GET /api/jobs/:id`: the job with its customer, site and activity. */
export async function getJob(id: string, signal?: AbortSignal): Promise<JobDetailView> {
  const body = await api.get<ItemResponse<JobDetailView>>(`/jobs/${encodeURIComponent(id)}`, {
    signal,
  });
  return body.data;
}

export function jobQueryOptions(id: string) {
  return queryOptions({
    queryKey: jobKeys.detail(id),
    queryFn: ({ signal }) => getJob(id, signal),
  });
}

export function useJob(id: string): JobDetailView {
  return useSuspenseQuery(jobQueryOptions(id)).data;
}
