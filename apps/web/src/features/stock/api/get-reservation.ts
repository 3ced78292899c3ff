import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ItemResponse, JobReservationView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `GET /api/jobs/:id/reservations`: the turf held (or cut) for a job. */
export async function getReservation(
  jobId: string,
  signal?: AbortSignal,
): Promise<JobReservationView> {
  return (
    await api.get<ItemResponse<JobReservationView>>(
      `/jobs/${encodeURIComponent(jobId)}/reservations`,
      { signal },
    )
  ).data;
}

export function reservationQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: stockKeys.reservation(jobId),
    queryFn: ({ signal }) => getReservation(jobId, signal),
  });
}

export function useReservation(jobId: string) {
  return useQuery(reservationQueryOptions(jobId));
}
