import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateAreaInput, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';
import type { Area } from './area-types';

/** `POST /api/jobs/:id/areas`: the area is planned on the server and saved with its plan. */
export async function createArea(jobId: string, input: CreateAreaInput): Promise<Area> {
  return (await api.post<ItemResponse<Area>>(`/jobs/${encodeURIComponent(jobId)}/areas`, input))
    .data;
}

export function useCreateArea(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateAreaInput) => createArea(jobId, input),
    onSuccess: async (area) => {
      queryClient.setQueryData(areaKeys.detail(area.id), area);
      await queryClient.invalidateQueries({ queryKey: areaKeys.ofJob(jobId) });
    },
  });
}
