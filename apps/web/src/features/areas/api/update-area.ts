import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, UpdateAreaInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';
import type { Area } from './area-types';

/** `PATCH /api/areas/:id`: planned again when the drawing, roll, grain or product changed. */
export async function updateArea(id: string, input: UpdateAreaInput): Promise<Area> {
  return (await api.patch<ItemResponse<Area>>(`/areas/${encodeURIComponent(id)}`, input)).data;
}

export function useUpdateArea(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateAreaInput) => updateArea(id, input),
    onSuccess: async (area) => {
      queryClient.setQueryData(areaKeys.detail(id), area);
      await queryClient.invalidateQueries({ queryKey: areaKeys.ofJob(area.jobId) });
    },
  });
}
