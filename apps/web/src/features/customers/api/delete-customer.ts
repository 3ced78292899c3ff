import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { customerKeys } from './customer-keys';

/** `DELETE /api/customers/:id`: removes the customer and its sites. */
export async function deleteCustomer(id: string): Promise<void> {
  await api.delete(`/customers/${encodeURIComponent(id)}`);
}

export function useDeleteCustomer(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteCustomer(id),
    onSuccess: async () => {
      queryClient.removeQueries({ queryKey: customerKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}
