import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';

/** `DELETE /api/areas/:id`: the area and its plan go; the job's takeoff follows. */
export async function deleteArea(id: string): Promise<void> {
  await api.delete(`/areas/${encodeURIComponent(id)}`);
}

export function useDeleteArea(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteArea,
    onSuccess: async (_result, id) => {
      queryClient.removeQueries({ queryKey: areaKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: areaKeys.ofJob(jobId) });
    },
  });
}
