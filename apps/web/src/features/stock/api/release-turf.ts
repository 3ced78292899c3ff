import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `DELETE /api/jobs/:id/reservations`: give back what the job holds and has not cut. */
export function releaseTurf(jobId: string): Promise<void> {
  return api.delete(`/jobs/${encodeURIComponent(jobId)}/reservations`);
}

export function useReleaseTurf(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => releaseTurf(jobId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}
