import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  BookingSaved,
  BookingView,
  CreateBookingInput,
  CrewView,
  ItemResponse,
  JobView,
  ListResponse,
  UpdateBookingInput,
} from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { crewsKey } from '../../../lib/query-client';

const bookingsKey = ['bookings'] as const;

/** `GET /api/bookings?from&to&crewId`: the bookings sharing a day with the range. */
export function useBookings(range: { from: string; to: string } | null, crewId: string) {
  return useQuery({
    queryKey: [...bookingsKey, range, crewId],
    enabled: range !== null,
    queryFn: ({ signal }) =>
      api.get<{ data: BookingView[] }>('/bookings', {
        query: { from: range?.from, to: range?.to, crewId: crewId || undefined },
        signal,
      }),
    select: (body) => body.data,
    placeholderData: keepPreviousData,
  });
}

/** The crews that can be booked (archived ones are left out). */
export function useCalendarCrews() {
  return useQuery({
    queryKey: [...crewsKey, 'active'],
    queryFn: ({ signal }) => api.get<{ data: CrewView[] }>('/crews', { signal }),
    select: (body) => body.data,
  });
}

/** Jobs a crew may be booked on: accepted up to in progress. */
export function useBookableJobs(enabled: boolean) {
  return useQuery({
    queryKey: ['calendar', 'bookable-jobs'],
    enabled,
    queryFn: ({ signal }) =>
      api.get<ListResponse<JobView>>('/jobs', {
        query: { status: 'accepted,scheduled,in_progress', pageSize: 100, sort: 'title' },
        signal,
      }),
    select: (body) => body.data,
  });
}

function useRefresh() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: bookingsKey });
}

export function useCreateBooking() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (input: CreateBookingInput) =>
      (await api.post<ItemResponse<BookingSaved>>('/bookings', input)).data,
    onSettled: refresh,
  });
}

export function useUpdateBooking() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async ({ id, ...input }: UpdateBookingInput & { id: string }) =>
      (await api.patch<ItemResponse<BookingSaved>>(`/bookings/${encodeURIComponent(id)}`, input))
        .data,
    onSettled: refresh,
  });
}

export function useDeleteBooking() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/bookings/${encodeURIComponent(id)}`),
    onSettled: refresh,
  });
}
