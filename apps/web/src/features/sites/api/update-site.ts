import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, SiteView, UpdateSiteInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** `PATCH /api/sites/:id`. */
export async function updateSite(siteId: string, input: UpdateSiteInput): Promise<SiteView> {
  const body = await api.patch<ItemResponse<SiteView>>(
    `/sites/${encodeURIComponent(siteId)}`,
    input,
  );
  return body.data;
}

export function useUpdateSite(customerId: string, siteId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateSiteInput) => updateSite(siteId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: siteKeys.list(customerId) }),
  });
}
