import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateSiteInput, ItemResponse, SiteView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** `POST /api/customers/:id/sites`. */
export async function createSite(customerId: string, input: CreateSiteInput): Promise<SiteView> {
  const body = await api.post<ItemResponse<SiteView>>(
    `/customers/${encodeURIComponent(customerId)}/sites`,
    input,
  );
  return body.data;
}

/** The customer's site count changes too, so every customer query is refreshed. */
export function useCreateSite(customerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateSiteInput) => createSite(customerId, input),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: siteKeys.list(customerId) });
      // The customers feature's key root, named rather than imported: features stay independent.
      await queryClient.invalidateQueries({ queryKey: ['customers'] });
    },
  });
}
