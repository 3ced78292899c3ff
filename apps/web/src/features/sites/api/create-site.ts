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

/**
 * `onCreated` lets the route refresh what else shows the customer's sites (their count on the
 * customer pages) without this feature knowing the customers feature.
 */
export function useCreateSite(customerId: string, onCreated: () => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateSiteInput) => createSite(customerId, input),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: siteKeys.list(customerId) });
      await onCreated();
    },
  });
}
