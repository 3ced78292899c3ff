import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { areaKeys } from './area-keys';
import type { Area } from './area-types';

/** `GET /api/areas/:id`: one area with its plan and alternatives. */
export async function getArea(id: string, signal?: AbortSignal): Promise<Area> {
  const body = await api.get<ItemResponse<Area>>(`/areas/${encodeURIComponent(id)}`, { signal });
  return body.data;
}

export function areaQueryOptions(id: string) {
  return queryOptions({
    queryKey: areaKeys.detail(id),
    queryFn: ({ signal }) => getArea(id, signal),
  });
}

export function useArea(id: string): Area {
  return useSuspenseQuery(areaQueryOptions(id)).data;
}
