import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateJobInput, ItemResponse, JobDetailView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** `POST /api/jobs`: a new lead for one of the customer's sites. */
export async function createJob(input: CreateJobInput): Promise<JobDetailView> {
  return (await api.post<ItemResponse<JobDetailView>>('/jobs', input)).data;
}

export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    onSuccess: async (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      await queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
