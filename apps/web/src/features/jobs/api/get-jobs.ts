import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { JobView, ListResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import type { JobListParams } from '../utils/list-params';
import { jobKeys } from './job-keys';

/** `GET /api/jobs`: one page of the company's jobs. */
export function getJobs(
  params: JobListParams,
  signal?: AbortSignal,
): Promise<ListResponse<JobView>> {
  return api.get<ListResponse<JobView>>('/jobs', {
    query: {
      page: params.page,
      pageSize: params.pageSize,
      sort: params.sort,
      q: params.q || undefined,
      status: params.status.length ? params.status.join(',') : undefined,
      from: params.from || undefined,
      to: params.to || undefined,
    },
    signal,
  });
}

export function jobsQueryOptions(params: JobListParams) {
  return queryOptions({
    queryKey: jobKeys.list(params),
    queryFn: ({ signal }) => getJobs(params, signal),
  });
}

/** Keeps showing the previous page while the next one loads, so the table does not jump. */
export function useJobs(params: JobListParams) {
  return useQuery({ ...jobsQueryOptions(params), placeholderData: keepPreviousData });
}
