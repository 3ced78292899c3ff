import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, JobDetailView, UpdateJobInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** `PATCH /api/jobs/:id`: rename, or move the status one lifecycle step. */
export async function updateJob(id: string, input: UpdateJobInput): Promise<JobDetailView> {
  return (await api.patch<ItemResponse<JobDetailView>>(`/jobs/${encodeURIComponent(id)}`, input))
    .data;
}

export function useUpdateJob(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateJobInput) => updateJob(id, input),
    onSuccess: async (job) => {
      queryClient.setQueryData(jobKeys.detail(id), job);
      await queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
    // Refused (say someone else moved it first): show what the server holds now.
    onError: () => queryClient.invalidateQueries({ queryKey: jobKeys.detail(id) }),
  });
}
