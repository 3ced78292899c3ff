import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateReservationInput, ItemResponse, JobReservationView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `POST /api/jobs/:id/reservations`: hold the job's pieces on rolls of one lot per product. */
export async function reserveTurf(
  jobId: string,
  input: CreateReservationInput,
): Promise<JobReservationView> {
  const path = `/jobs/${encodeURIComponent(jobId)}/reservations`;
  return (await api.post<ItemResponse<JobReservationView>>(path, input)).data;
}

export function useReserveTurf(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateReservationInput) => reserveTurf(jobId, input),
    onSuccess: async (reservation) => {
      queryClient.setQueryData(stockKeys.reservation(jobId), reservation);
      // The rolls' held and free lengths changed too.
      await queryClient.invalidateQueries({ queryKey: stockKeys.all });
    },
  });
}
