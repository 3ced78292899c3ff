import { queryOptions, useMutation, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import type {
  EstimatingSettingsView,
  ItemResponse,
  UpdateEstimatingSettingsInput,
} from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { estimatingKeys } from './estimating-keys';

/** `GET /api/estimating-settings`: effective values, each with its standard and source. */
export async function getEstimatingSettings(signal?: AbortSignal) {
  return (await api.get<ItemResponse<EstimatingSettingsView>>('/estimating-settings', { signal }))
    .data;
}

export function estimatingSettingsQueryOptions() {
  return queryOptions({
    queryKey: estimatingKeys.settings(),
    queryFn: ({ signal }) => getEstimatingSettings(signal),
  });
}

export function useEstimatingSettings(): EstimatingSettingsView {
  return useSuspenseQuery(estimatingSettingsQueryOptions()).data;
}

/** `PATCH /api/estimating-settings`: only what changes; a `null` takeoff leaf resets it. */
export function useUpdateEstimatingSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: UpdateEstimatingSettingsInput) =>
      (await api.patch<ItemResponse<EstimatingSettingsView>>('/estimating-settings', input)).data,
    onSuccess: (view) => client.setQueryData(estimatingKeys.settings(), view),
  });
}
