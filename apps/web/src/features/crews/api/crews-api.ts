import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateCrewInput,
  CrewDeletion,
  CrewView,
  ItemResponse,
  UpdateCrewInput,
} from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { crewsKey } from '../../../lib/query-client';

/** `GET /api/crews?includeArchived=true`: every crew, archived ones too (to restore them). */
export function crewsQueryOptions() {
  return queryOptions({
    queryKey: [...crewsKey, 'all'],
    queryFn: ({ signal }) =>
      api.get<{ data: CrewView[] }>('/crews', { query: { includeArchived: 'true' }, signal }),
    select: (body) => body.data,
  });
}

export const useCrews = () => useQuery(crewsQueryOptions());

function useRefreshCrews() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: crewsKey });
}

export function useSaveCrew(id: string | null) {
  const refresh = useRefreshCrews();
  return useMutation({
    mutationFn: async (input: CreateCrewInput | UpdateCrewInput) =>
      id
        ? (await api.patch<ItemResponse<CrewView>>(`/crews/${encodeURIComponent(id)}`, input)).data
        : (await api.post<ItemResponse<CrewView>>('/crews', input)).data,
    onSuccess: refresh,
  });
}

export function useDeleteCrew() {
  const refresh = useRefreshCrews();
  return useMutation({
    mutationFn: async (id: string) =>
      (await api.delete<ItemResponse<CrewDeletion>>(`/crews/${encodeURIComponent(id)}`)).data,
    onSuccess: refresh,
  });
}

export function useRestoreCrew() {
  const refresh = useRefreshCrews();
  return useMutation({
    mutationFn: (id: string) => api.patch(`/crews/${encodeURIComponent(id)}`, { archived: false }),
    onSuccess: refresh,
  });
}
