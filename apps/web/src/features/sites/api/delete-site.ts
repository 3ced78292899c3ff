import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** `DELETE /api/sites/:id`. */
export async function deleteSite(siteId: string): Promise<void> {
  await api.delete(`/sites/${encodeURIComponent(siteId)}`);
}

export function useDeleteSite(customerId: string, siteId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSite(siteId),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: siteKeys.list(customerId) });
      // The customers feature's key root (its site count changes), named rather than imported.
      await queryClient.invalidateQueries({ queryKey: ['customers'] });
    },
  });
}
