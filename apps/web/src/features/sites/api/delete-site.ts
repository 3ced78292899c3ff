import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** `DELETE /api/sites/:id`. */
export async function deleteSite(siteId: string): Promise<void> {
  await api.delete(`/sites/${encodeURIComponent(siteId)}`);
}

/** `onDeleted` refreshes what else shows the customer's sites; see `useCreateSite`. */
export function useDeleteSite(
  customerId: string,
  siteId: string,
  onDeleted: () => Promise<unknown>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSite(siteId),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: siteKeys.list(customerId) });
      await onDeleted();
    },
  });
}
